"use client";
// Removes a photo or manual through the file route (keepers only; the route checks).
import { useRouter } from "next/navigation";
import { useState } from "react";

export function RemoveFileButton({ url, fileName }: { url: string; fileName: string }) {
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
          setBusy(true);
          const response = await fetch(url, { method: "DELETE" });
          setBusy(false);
          if (response.ok) router.refresh();
          else setError((await response.json()).message ?? "The file could not be removed.");
        }}
      >
        Remove <span className="sr-only">{fileName}</span>
      </button>
      {error && (
        <span role="alert" className="text-sm font-bold text-danger-600">
          {error}
        </span>
      )}
    </>
  );
}
