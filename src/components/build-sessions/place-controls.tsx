"use client";

import { useRouter } from "next/navigation";
import { useState, useTransition } from "react";
import { Button } from "@/components/ui/button";
import { Notice } from "@/components/ui/notice";
import type { ActionResult } from "@/server/action";
import type { MyPlace } from "@/server/services/build-sessions";

interface PlaceControlsProps {
  sessionId: string;
  myPlace: MyPlace | null;
  full: boolean;
  open: boolean;
  signUp: (input: { sessionId: string }) => Promise<ActionResult>;
  cancel: (input: { sessionId: string }) => Promise<ActionResult>;
}

/** Take a place (or a place in line), or give it up. */
export function PlaceControls({ sessionId, myPlace, full, open, signUp, cancel }: PlaceControlsProps) {
  const router = useRouter();
  const [pending, startTransition] = useTransition();
  const [message, setMessage] = useState<{ ok: boolean; text: string } | null>(null);
  const run = (action: typeof signUp) =>
    startTransition(async () => {
      const result = await action({ sessionId });
      setMessage({ ok: result.ok, text: result.message ?? Object.values(result.fieldErrors ?? {})[0] ?? "That did not work." });
      router.refresh();
    });

  return (
    <div>
      {message && <Notice tone={message.ok ? "success" : "danger"}>{message.text}</Notice>}
      {myPlace?.status === "confirmed" && <p className="mb-3 font-bold text-copper-900">You have a place at this session.</p>}
      {myPlace?.status === "waitlisted" && <p className="mb-3 font-bold text-copper-900">You are number {myPlace.position} on the waitlist.</p>}
      {!myPlace && open && (
        <Button disabled={pending} onClick={() => run(signUp)}>
          {full ? "Join the waitlist" : "Sign up"}
        </Button>
      )}
      {myPlace && (
        <Button variant="secondary" disabled={pending} onClick={() => run(cancel)}>
          {myPlace.status === "confirmed" ? "Give up my place" : "Leave the waitlist"}
        </Button>
      )}
    </div>
  );
}

/** A coordinator's cancel button with an optional note for the message. */
export function CancelSessionForm({ sessionId, cancelSession }: { sessionId: string; cancelSession: (input: { sessionId: string; reason?: string }) => Promise<ActionResult> }) {
  const router = useRouter();
  const [reason, setReason] = useState("");
  const [pending, startTransition] = useTransition();
  const [message, setMessage] = useState<string | null>(null);
  return (
    <form
      onSubmit={(event) => {
        event.preventDefault();
        startTransition(async () => {
          const result = await cancelSession({ sessionId, reason });
          setMessage(result.ok ? null : (result.message ?? "That did not work."));
          router.refresh();
        });
      }}
    >
      {message && <Notice tone="danger">{message}</Notice>}
      <label htmlFor="cancel-reason" className="block font-bold">
        Note for everyone signed up (optional)
      </label>
      <input id="cancel-reason" className="mb-3 mt-1 block min-h-11 w-full rounded-lg border border-slate-400 px-3" value={reason} onChange={(event) => setReason(event.target.value)} />
      <Button type="submit" variant="danger" disabled={pending}>
        Cancel this session
      </Button>
    </form>
  );
}
