"use client";
// A small danger button that sends DELETE to a route (the route checks who may), shows the
// route's message when refused, and refreshes the page (or goes to `then`) when it succeeds.
import { useRouter } from "next/navigation";
import { useState } from "react";

interface DeleteButtonProps {
  url: string;
  /** The visible word, e.g. "Remove" or "Delete". */
  verb: string;
  /** What is deleted, for screen readers and the messages, e.g. "the sweep of 3 Oct 10:40". */
  what: string;
  /** Ask before deleting with this question. */
  confirm?: string;
  /** Where to go after deleting; the current page is refreshed when absent. */
  then?: string;
}

export function DeleteButton({ url, verb, what, confirm, then }: DeleteButtonProps) {
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
          if (confirm && !window.confirm(confirm)) return;
          setBusy(true);
          const response = await fetch(url, { method: "DELETE" });
          setBusy(false);
          if (!response.ok) {
            setError((await response.json().catch(() => ({}))).message ?? `Could not delete ${what}.`);
            return;
          }
          if (then) router.push(then);
          router.refresh();
        }}
      >
        {verb} <span className="sr-only">{what}</span>
      </button>
      {error && (
        <span role="alert" className="text-sm font-bold text-danger-600">
          {error}
        </span>
      )}
    </>
  );
}
