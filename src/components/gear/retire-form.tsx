"use client";
import { useRouter } from "next/navigation";
import { useState, useTransition } from "react";
import { retireItemAction } from "@/app/(club)/gear/actions";
import { Button } from "@/components/ui/button";

export function RetireForm({ itemId }: { itemId: string }) {
  const router = useRouter();
  const [reason, setReason] = useState("");
  const [error, setError] = useState<string | null>(null);
  const [pending, startTransition] = useTransition();
  return (
    <form
      className="flex flex-wrap items-end gap-3"
      aria-label="Retire this item"
      onSubmit={(event) => {
        event.preventDefault();
        startTransition(async () => {
          const result = await retireItemAction({ id: itemId, reason });
          setError(result.ok ? null : (result.message ?? result.fieldErrors?.reason ?? "That did not work."));
          if (result.ok) router.refresh();
        });
      }}
    >
      <label className="block font-bold">
        Why retire it?
        <input value={reason} onChange={(event) => setReason(event.target.value)} required minLength={3} className="mt-1 block min-h-11 rounded-lg border border-slate-400 bg-white px-2" />
      </label>
      <Button type="submit" variant="danger" disabled={pending}>
        Retire the item
      </Button>
      {error && (
        <p role="alert" className="w-full font-bold text-danger-600">
          {error}
        </p>
      )}
    </form>
  );
}
