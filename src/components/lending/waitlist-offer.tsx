"use client";
// An open waitlist offer (accept or let it go) or a place in the line (leave it).
import { useRouter } from "next/navigation";
import { useState, useTransition } from "react";
import { waitlistStepAction } from "@/app/(club)/lending/actions";
import { Button } from "@/components/ui/button";

export function WaitlistButtons({ entryId, offered }: { entryId: string; offered: boolean }) {
  const router = useRouter();
  const [message, setMessage] = useState<{ ok: boolean; text: string } | null>(null);
  const [pending, startTransition] = useTransition();
  const run = (action: "accept" | "withdraw") =>
    startTransition(async () => {
      const result = await waitlistStepAction({ entryId, action });
      setMessage({ ok: result.ok, text: result.message ?? "That did not work." });
      if (result.ok) router.refresh();
    });
  return (
    <div className="mt-2 flex flex-wrap items-center gap-2">
      {offered && (
        <Button disabled={pending} onClick={() => run("accept")}>
          Accept the offer
        </Button>
      )}
      <Button variant="secondary" disabled={pending} onClick={() => run("withdraw")}>
        {offered ? "Let it go" : "Leave the waitlist"}
      </Button>
      {message && (
        <p role={message.ok ? "status" : "alert"} className={`w-full text-sm font-bold ${message.ok ? "text-copper-800" : "text-danger-600"}`}>
          {message.text}
        </p>
      )}
    </div>
  );
}
