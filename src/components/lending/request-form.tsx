"use client";
// Asking for an item for a time range in the club's time zone, or for an upcoming antenna day
// (and optionally one of its station slots), which gives the time range. If the time is taken,
// the form offers the next free time or a place on the waitlist.
import { useRouter } from "next/navigation";
import { useState, useTransition, type FormEvent } from "react";
import { joinWaitlistAction, requestBookingAction, requestForDayAction } from "@/app/(club)/lending/actions";
import { Button } from "@/components/ui/button";
import { SelectField } from "@/components/ui/field";
import { Notice } from "@/components/ui/notice";
import { formatInZone, formatRangeInZone, instantToWallTime } from "@/lib/time";
import type { DayChoice } from "@/server/services/station-kits";

interface RequestFormProps {
  itemId: string;
  timeZone: string;
  defaultStart: string;
  defaultEnd: string;
  needsCoSign: boolean;
  /** Upcoming antenna days a request can be tied to. */
  days: DayChoice[];
}

export function RequestForm({ itemId, timeZone, defaultStart, defaultEnd, needsCoSign, days }: RequestFormProps) {
  const router = useRouter();
  const [startsAt, setStartsAt] = useState(defaultStart);
  const [endsAt, setEndsAt] = useState(defaultEnd);
  const [dayId, setDayId] = useState("");
  const [slotId, setSlotId] = useState("");
  const day = days.find((choice) => choice.id === dayId);
  const [note, setNote] = useState("");
  const [message, setMessage] = useState<{ ok: boolean; text: string } | null>(null);
  const [nextFree, setNextFree] = useState<{ start: string; end: string } | null>(null);
  const [pending, startTransition] = useTransition();

  const submit = (event: FormEvent) => {
    event.preventDefault();
    startTransition(async () => {
      const result = day ? await requestForDayAction({ itemId, antennaDayId: day.id, stationSlotId: slotId, note }) : await requestBookingAction({ itemId, startsAt, endsAt, note });
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

  const chooseDay = (id: string) => {
    setDayId(id);
    setSlotId("");
    const chosen = days.find((choice) => choice.id === id);
    // The day's own times, shown (read-only) and used for the waitlist should it be booked.
    setStartsAt(chosen ? instantToWallTime(new Date(chosen.startsAt), timeZone) : defaultStart);
    setEndsAt(chosen ? instantToWallTime(new Date(chosen.endsAt), timeZone) : defaultEnd);
  };

  return (
    <form onSubmit={submit} aria-label="Request this item" className="grid gap-3 sm:max-w-xl">
      {needsCoSign && (
        <Notice tone="info">Newcomers borrow an analyser with a mentor&apos;s co-sign: your request waits for a mentor, then a steward approves it.</Notice>
      )}
      {days.length > 0 && (
        <SelectField
          label="For an antenna day (optional)"
          value={dayId}
          onChange={(event) => chooseDay(event.target.value)}
          options={[{ value: "", label: "No: I give the times" }, ...days.map((choice) => ({ value: choice.id, label: `${choice.title}, ${formatRangeInZone(choice.startsAt, choice.endsAt, timeZone)}` }))]}
        />
      )}
      {day && day.slots.length > 0 && (
        <SelectField
          label="Station slot (optional)"
          value={slotId}
          onChange={(event) => setSlotId(event.target.value)}
          options={[{ value: "", label: "The whole day, no slot" }, ...day.slots.map((slot) => ({ value: slot.id, label: slot.name }))]}
        />
      )}
      {day ? (
        <p data-testid="request-day-times">
          From the day&apos;s start to its end: <span className="font-bold">{formatRangeInZone(day.startsAt, day.endsAt, timeZone)}</span> ({timeZone}).
        </p>
      ) : (
        <>
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
        </>
      )}
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
              setDayId("");
              setSlotId("");
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
