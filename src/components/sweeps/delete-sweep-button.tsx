"use client";
// Deletes a sweep with its raw file (the uploader or a coordinator; the route checks).
import { useRouter } from "next/navigation";
import { useState } from "react";

export function DeleteSweepButton({ sweepId, label, pagePath }: { sweepId: string; label: string; pagePath: string }) {
  const router = useRouter();
  const [error, setError] = useState<string | null>(null);
  const [busy, setBusy] = useState(false);
  return (
    <>
      <button
        type="button"
        disabled={busy}
        className="min-h-11 rounded-lg px-2 text-sm font-bold text-danger-600 hover:bg-danger-50"
        onClick={async () => {
          if (!window.confirm(`Delete the sweep of ${label} and its file?`)) return;
          setBusy(true);
          const response = await fetch(`/api/sweeps/${sweepId}`, { method: "DELETE" });
          setBusy(false);
          if (!response.ok) {
            setError((await response.json()).message ?? "The sweep could not be deleted.");
            return;
          }
          router.push(pagePath);
          router.refresh();
        }}
      >
        Delete <span className="sr-only">the sweep of {label}</span>
      </button>
      {error && (
        <span role="alert" className="text-sm font-bold text-danger-600">
          {error}
        </span>
      )}
    </>
  );
}
