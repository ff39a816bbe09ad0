import type { BuildSessionSummary } from "@/server/services/build-sessions";

/** Places left, the waitlist and the viewer's own place, in words (colour is never the only cue). */
export function PlacesBadge({ session }: { session: Pick<BuildSessionSummary, "status" | "capacity" | "taken" | "waitlisted" | "myPlace"> }) {
  if (session.status === "cancelled") {
    return <span className="inline-block rounded-md border border-danger-600 px-2 py-1 text-sm font-bold text-danger-800">Cancelled</span>;
  }
  const left = session.capacity - session.taken;
  return (
    <p className="flex flex-wrap gap-2 text-sm">
      <span className="rounded-md bg-slate-100 px-2 py-1 font-bold text-slate-800">
        {left > 0 ? `${left} of ${session.capacity} places left` : `Full (${session.capacity} places)`}
        {session.waitlisted > 0 && `, ${session.waitlisted} waiting`}
      </span>
      {session.myPlace?.status === "confirmed" && <span className="rounded-md bg-copper-100 px-2 py-1 font-bold text-copper-900">You have a place</span>}
      {session.myPlace?.status === "waitlisted" && (
        <span className="rounded-md bg-copper-50 px-2 py-1 font-bold text-copper-900">You are number {session.myPlace.position} on the waitlist</span>
      )}
    </p>
  );
}
