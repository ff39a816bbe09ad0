"use client";

import { useRouter } from "next/navigation";
import { useState, useTransition } from "react";
import { addShiftAction, cancelSignUpAction, deleteShiftAction, signUpAction } from "@/app/(club)/antenna-days/actions";
import { useActionForm } from "@/components/forms/use-action-form";
import { Button } from "@/components/ui/button";
import { TextField } from "@/components/ui/field";
import { Notice } from "@/components/ui/notice";
import { formatRangeInZone } from "@/lib/time";
import type { ActionResult } from "@/server/action";
import type { ShiftDto } from "@/server/services/shifts";
import { shiftFormSchema } from "@/validations/antenna-days";

/** A slot's shifts: who operates when, sign-up and cancel for members, delete for coordinators. */
export function ShiftList({ slotName, shifts, manage, timeZone }: { slotName: string; shifts: ShiftDto[]; manage: boolean; timeZone: string }) {
  const router = useRouter();
  const [pending, startTransition] = useTransition();
  const [message, setMessage] = useState<{ ok: boolean; text: string } | null>(null);
  const run = (action: () => Promise<ActionResult>) =>
    startTransition(async () => {
      const result = await action();
      setMessage({ ok: result.ok, text: result.message ?? (result.ok ? "Done." : "That did not work.") });
      router.refresh();
    });

  if (shifts.length === 0) return <p className="text-sm text-slate-600">No shifts yet.</p>;
  return (
    <div>
      {message && <Notice tone={message.ok ? "success" : "danger"}>{message.text}</Notice>}
      <ul className="divide-y divide-slate-200" aria-label={`Shifts of ${slotName}`}>
        {shifts.map((shift) => {
          const label = formatRangeInZone(shift.startsAt, shift.endsAt, timeZone);
          return (
            <li key={shift.id} className="flex flex-wrap items-center gap-x-4 gap-y-2 py-2">
              <div className="min-w-52 flex-1">
                <p className="font-bold">{label}</p>
                <p className="text-sm text-slate-700">
                  {shift.taken} of {shift.capacity} {shift.capacity === 1 ? "place" : "places"} taken
                  {shift.people.length > 0 && `: ${shift.people.map((person) => (person.callSign ? `${person.name} (${person.callSign})` : person.name)).join(", ")}`}
                </p>
              </div>
              {shift.signedUp ? (
                <Button variant="secondary" disabled={pending} onClick={() => run(() => cancelSignUpAction({ shiftId: shift.id }))} aria-label={`Cancel my sign-up for ${slotName} ${label}`}>
                  Cancel my sign-up
                </Button>
              ) : shift.signUpBlockedBy === null ? (
                <Button disabled={pending} onClick={() => run(() => signUpAction({ shiftId: shift.id }))} aria-label={`Sign up for ${slotName} ${label}`}>
                  Sign up
                </Button>
              ) : (
                <span className="text-sm text-slate-600">{shift.signUpBlockedBy}</span>
              )}
              {manage && (
                <Button
                  variant="quiet"
                  disabled={pending}
                  aria-label={`Delete the shift ${slotName} ${label}`}
                  onClick={() => {
                    if (window.confirm("Delete this shift and its sign-ups?")) run(() => deleteShiftAction({ shiftId: shift.id }));
                  }}
                >
                  Delete
                </Button>
              )}
            </li>
          );
        })}
      </ul>
    </div>
  );
}

export function AddShiftForm({ slotId, slotName, defaults }: { slotId: string; slotName: string; defaults: { startsAtLocal: string; endsAtLocal: string } }) {
  const router = useRouter();
  const { form, onSubmit, errorOf, formMessage, submitting } = useActionForm(shiftFormSchema, addShiftAction, {
    defaultValues: { slotId, capacity: 2, ...defaults },
    onSuccess: () => router.refresh(),
  });
  return (
    <form onSubmit={onSubmit} noValidate aria-label={`Add a shift to ${slotName}`} className="mt-3 rounded-lg border border-slate-200 bg-slate-50 p-3">
      {formMessage && <Notice tone={formMessage.ok ? "success" : "danger"}>{formMessage.text}</Notice>}
      <div className="grid gap-x-4 sm:grid-cols-3">
        <TextField label="Shift starts" type="datetime-local" error={errorOf("startsAtLocal")} {...form.register("startsAtLocal")} />
        <TextField label="Shift ends" type="datetime-local" error={errorOf("endsAtLocal")} {...form.register("endsAtLocal")} />
        <TextField label="Operators" type="number" min={1} max={50} error={errorOf("capacity")} {...form.register("capacity")} />
      </div>
      <Button type="submit" variant="secondary" disabled={submitting}>
        Add shift
      </Button>
    </form>
  );
}
