"use client";
// The buttons for a booking's next steps; steps that record something open a short form first.
import { useQueryClient } from "@tanstack/react-query";
import { useRouter } from "next/navigation";
import { useState, useTransition, type FormEvent } from "react";
import { bookingStepAction } from "@/app/(club)/lending/actions";
import { Button } from "@/components/ui/button";
import { gearConditionLabels, shelfConditions, type ShelfCondition } from "@/lib/gear/kinds";
import { bookingActionLabels, type BookingAction } from "@/lib/lending/states";
import type { BookingStepInput } from "@/validations/lending";

interface StepBooking {
  id: string;
  itemId: string;
  itemLabelCode: string;
  borrowerName: string;
}

const needsForm: ReadonlySet<BookingAction> = new Set(["decline", "hand-out", "return", "mark-lost"]);

export function BookingSteps({ booking, steps, isBorrower, currentCondition }: { booking: StepBooking; steps: BookingAction[]; isBorrower: boolean; currentCondition?: ShelfCondition }) {
  const router = useRouter();
  const queryClient = useQueryClient();
  const [open, setOpen] = useState<BookingAction | null>(null);
  const [message, setMessage] = useState<{ ok: boolean; text: string } | null>(null);
  const [pending, startTransition] = useTransition();

  const run = (step: BookingStepInput) =>
    startTransition(async () => {
      const result = await bookingStepAction({ bookingId: booking.id, step });
      const text = result.message ?? Object.values(result.fieldErrors ?? {})[0] ?? (result.ok ? "Done." : "That did not work.");
      setMessage({ ok: result.ok, text });
      if (result.ok) {
        setOpen(null);
        await queryClient.invalidateQueries({ queryKey: ["bookings"] });
        router.refresh();
      }
    });

  const label = (step: BookingAction) => {
    if (step === "return") return isBorrower ? "Return it" : "Take back";
    if (step === "cancel") return "Cancel booking";
    return bookingActionLabels[step];
  };

  if (steps.length === 0) return null;
  return (
    <div className="mt-2">
      <div className="flex flex-wrap gap-2">
        {steps.map((step) => (
          <Button
            key={step}
            variant={step === "decline" || step === "mark-lost" || step === "cancel" ? "secondary" : "primary"}
            disabled={pending}
            aria-expanded={needsForm.has(step) ? open === step : undefined}
            onClick={() => (needsForm.has(step) ? setOpen(open === step ? null : step) : run({ action: step } as BookingStepInput))}
          >
            {label(step)} <span className="sr-only">{booking.itemLabelCode} for {booking.borrowerName}</span>
          </Button>
        ))}
      </div>
      {open && <StepForm step={open} booking={booking} pending={pending} currentCondition={currentCondition} onSubmit={run} onError={(text) => setMessage({ ok: false, text })} />}
      {message && (
        <p role={message.ok ? "status" : "alert"} className={`mt-2 text-sm font-bold ${message.ok ? "text-copper-800" : "text-danger-600"}`}>
          {message.text}
        </p>
      )}
    </div>
  );
}

function StepForm({
  step,
  booking,
  pending,
  currentCondition,
  onSubmit,
  onError,
}: {
  step: BookingAction;
  booking: StepBooking;
  pending: boolean;
  currentCondition?: ShelfCondition;
  onSubmit: (step: BookingStepInput) => void;
  onError: (text: string) => void;
}) {
  const [uploading, setUploading] = useState(false);
  const submit = async (event: FormEvent<HTMLFormElement>) => {
    event.preventDefault();
    const data = new FormData(event.currentTarget);
    const text = (name: string) => String(data.get(name) ?? "").trim();
    const condition = text("condition") as ShelfCondition;
    if (step === "decline") return onSubmit({ action: "decline", reason: text("reason") });
    if (step === "mark-lost") return onSubmit({ action: "mark-lost", note: text("note") });
    if (step === "hand-out") return onSubmit({ action: "hand-out", condition, note: text("note") || undefined });
    // A return: the photo (if any) is uploaded for this loan first, then the return refers to it.
    let photoFileId: string | undefined;
    const photo = data.get("photo");
    if (photo instanceof File && photo.size > 0) {
      setUploading(true);
      const upload = new FormData();
      upload.set("file", photo);
      upload.set("purpose", "return");
      upload.set("bookingId", booking.id);
      const response = await fetch(`/api/gear/${booking.itemId}/files`, { method: "POST", body: upload });
      setUploading(false);
      const body = await response.json();
      if (!response.ok) return onError(body.message ?? "The photo could not be uploaded.");
      photoFileId = body.file.id;
    }
    onSubmit({ action: "return", condition, damageNotes: text("damageNotes") || undefined, photoFileId });
  };

  const conditionSelect = (
    <label className="block font-bold">
      Condition now
      <select name="condition" defaultValue={currentCondition ?? "good"} className="mt-1 block min-h-11 w-full rounded-lg border border-slate-400 bg-white px-2">
        {shelfConditions.map((condition) => (
          <option key={condition} value={condition}>
            {gearConditionLabels[condition]}
          </option>
        ))}
      </select>
    </label>
  );

  return (
    <form onSubmit={submit} className="mt-3 grid gap-3 rounded-lg border border-slate-300 bg-slate-50 p-3 sm:max-w-lg" aria-label={`${step} ${booking.itemLabelCode}`}>
      {step === "decline" && (
        <label className="block font-bold">
          Reason for declining
          <input name="reason" required minLength={3} className="mt-1 block min-h-11 w-full rounded-lg border border-slate-400 bg-white px-2" />
        </label>
      )}
      {step === "mark-lost" && (
        <label className="block font-bold">
          What is known
          <input name="note" required minLength={3} className="mt-1 block min-h-11 w-full rounded-lg border border-slate-400 bg-white px-2" />
        </label>
      )}
      {step === "hand-out" && (
        <>
          {conditionSelect}
          <label className="block font-bold">
            Note (optional)
            <input name="note" className="mt-1 block min-h-11 w-full rounded-lg border border-slate-400 bg-white px-2" />
          </label>
        </>
      )}
      {step === "return" && (
        <>
          {conditionSelect}
          <label className="block font-bold">
            Damage or notes
            <textarea name="damageNotes" rows={2} className="mt-1 block w-full rounded-lg border border-slate-400 bg-white px-2 py-2" />
          </label>
          <label className="block font-bold">
            Photo (optional, JPEG, PNG or WebP up to 8 MB)
            <input name="photo" type="file" accept="image/jpeg,image/png,image/webp" capture="environment" className="mt-1 block w-full" />
          </label>
        </>
      )}
      <div>
        <Button type="submit" disabled={pending || uploading}>
          {uploading ? "Uploading the photo…" : step === "return" ? "Record the return" : step === "hand-out" ? "Record the hand-out" : step === "decline" ? "Decline the request" : "Mark as lost"}
        </Button>
      </div>
    </form>
  );
}
