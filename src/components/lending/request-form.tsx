"use client";
// Asking for an item for a time range in the club's time zone. If the time is taken, the form
// offers the next free time or a place on the waitlist.
import { useRouter } from "next/navigation";
import { useState, useTransition, type FormEvent } from "react";
import { joinWaitlistAction, requestBookingAction } from "@/app/(club)/lending/actions";
import { Button } from "@/components/ui/button";
import { Notice } from "@/components/ui/notice";
import { formatInZone, instantToWallTime } from "@/lib/time";

export function RequestForm({ itemId, timeZone, defaultStart, defaultEnd, needsCoSign }: { itemId: string; timeZone: string; defaultStart: string; defaultEnd: string; needsCoSign: boolean }) {
  const router = useRouter();
  const [startsAt, setStartsAt] = useState(defaultStart);
  const [endsAt, setEndsAt] = useState(defaultEnd);
  const [note, setNote] = useState("");
  const [message, setMessage] = useState<{ ok: boolean; text: string } | null>(null);
  const [nextFree, setNextFree] = useState<{ start: string; end: string } | null>(null);
  const [pending, startTransition] = useTransition();

  const submit = (event: FormEvent) => {
    event.preventDefault();
    startTransition(async () => {
      const result = await requestBookingAction({ itemId, startsAt, endsAt, note });
      const data = result.data as { nextFreeStart: string; nextFreeEnd: string } | undefined;
      setNextFree(data ? { start: data.nextFreeStart, end: data.nextFreeEnd } : null);
      setMessage({ ok: result.ok, text: result.message ?? Object.values(result.fieldErrors ?? {})[0] ?? "That did not work." });
      if (result.ok) router.refresh();
    });
  };

  const joinWaitlist = () =>
    startTransition(async () => {
      const result = await joinWaitlistAction({ itemId, startsAt, endsAt });
      setMessage({ ok: result.ok, text: result.message ?? Object.values(result.fieldErrors ?? {})[0] ?? "That did not work." });
      if (result.ok) {
        setNextFree(null);
        router.refresh();
      }
    });

  return (
    <form onSubmit={submit} aria-label="Request this item" className="grid gap-3 sm:max-w-xl">
      {needsCoSign && (
        <Notice tone="info">Newcomers borrow an analyser with a mentor&apos;s co-sign: your request waits for a mentor, then a steward approves it.</Notice>
      )}
      <div className="grid gap-3 sm:grid-cols-2">
        <label className="block font-bold">
          From
          <input type="datetime-local" required value={startsAt} onChange={(event) => setStartsAt(event.target.value)} className="mt-1 block min-h-11 w-full rounded-lg border border-slate-400 bg-white px-2" />
        </label>
        <label className="block font-bold">
          Until
          <input type="datetime-local" required value={endsAt} onChange={(event) => setEndsAt(event.target.value)} className="mt-1 block min-h-11 w-full rounded-lg border border-slate-400 bg-white px-2" />
        </label>
      </div>
      <p className="text-sm text-slate-600">Times are in the club&apos;s time zone ({timeZone}).</p>
      <label className="block font-bold">
        What it is for (optional)
        <input value={note} onChange={(event) => setNote(event.target.value)} maxLength={1000} className="mt-1 block min-h-11 w-full rounded-lg border border-slate-400 bg-white px-2" />
      </label>
      <div>
        <Button type="submit" disabled={pending}>
          Request it
        </Button>
      </div>
      {message && (
        <p role={message.ok ? "status" : "alert"} className={`font-bold ${message.ok ? "text-copper-800" : "text-danger-600"}`}>
          {message.text}
        </p>
      )}
      {nextFree && (
        <div className="flex flex-wrap gap-2">
          <Button
            variant="secondary"
            onClick={() => {
              setStartsAt(instantToWallTime(new Date(nextFree.start), timeZone));
              setEndsAt(instantToWallTime(new Date(nextFree.end), timeZone));
              setNextFree(null);
              setMessage(null);
            }}
          >
            Use the next free time ({formatInZone(nextFree.start, timeZone)})
          </Button>
          <Button variant="secondary" onClick={joinWaitlist} disabled={pending}>
            Join the waitlist for my time
          </Button>
        </div>
      )}
    </form>
  );
}
