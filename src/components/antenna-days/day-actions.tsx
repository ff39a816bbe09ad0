"use client";

import { useRouter } from "next/navigation";
import { useState, useTransition } from "react";
import { changeDayStatusAction, deleteDayAction } from "@/app/(club)/antenna-days/actions";
import { Button, ButtonLink } from "@/components/ui/button";
import { Notice } from "@/components/ui/notice";
import type { DayStatus } from "@/lib/antenna-days/status";
import type { ActionResult } from "@/server/action";

const statusButtons: Partial<Record<DayStatus, { label: string; variant: "primary" | "secondary" | "danger" }>> = {
  published: { label: "Publish", variant: "primary" },
  done: { label: "Mark as done", variant: "secondary" },
  cancelled: { label: "Cancel the day", variant: "danger" },
};

/** Cancelling a published day asks for a note to members; null when the coordinator steps back. */
function askCancelReason(status: DayStatus): string | null {
  if (status !== "published") return window.confirm("Cancel this draft? This cannot be undone.") ? "" : null;
  return window.prompt("Cancel this antenna day? Every member is told by e-mail, and it cannot be undone.\n\nA note for them, such as the reason (optional):", "");
}

/** The coordinator's buttons for a day: edit, copy, publish, mark done, cancel, delete a draft. */
export function DayActions({ dayId, status, nextStatuses, editable }: { dayId: string; status: DayStatus; nextStatuses: DayStatus[]; editable: boolean }) {
  const router = useRouter();
  const [pending, startTransition] = useTransition();
  const [message, setMessage] = useState<{ ok: boolean; text: string } | null>(null);

  const run = (action: () => Promise<ActionResult>, after?: () => void) =>
    startTransition(async () => {
      const result = await action();
      setMessage({ ok: result.ok, text: result.message ?? Object.values(result.fieldErrors ?? {})[0] ?? (result.ok ? "Done." : "That did not work.") });
      if (result.ok) (after ?? router.refresh)();
    });

  return (
    <div className="w-full">
      {message && <Notice tone={message.ok ? "success" : "danger"}>{message.text}</Notice>}
      <div className="flex flex-wrap gap-2">
        {editable && (
          <ButtonLink href={`/antenna-days/${dayId}/edit`} variant="secondary">
            Edit details
          </ButtonLink>
        )}
        <ButtonLink href={`/antenna-days/${dayId}/copy`} variant="secondary">
          Copy as a new day
        </ButtonLink>
        {nextStatuses.map((next) => {
          const button = statusButtons[next];
          if (!button) return null;
          return (
            <Button
              key={next}
              variant={button.variant}
              disabled={pending}
              onClick={() => {
                if (next !== "cancelled") return run(() => changeDayStatusAction({ dayId, status: next }));
                const cancelReason = askCancelReason(status);
                if (cancelReason !== null) run(() => changeDayStatusAction({ dayId, status: next, cancelReason }));
              }}
            >
              {button.label}
            </Button>
          );
        })}
        {status === "draft" && (
          <Button
            variant="quiet"
            disabled={pending}
            onClick={() => {
              if (!window.confirm("Delete this draft with its station slots and shifts?")) return;
              run(() => deleteDayAction({ dayId }), () => router.push("/antenna-days"));
            }}
          >
            Delete draft
          </Button>
        )}
      </div>
    </div>
  );
}
