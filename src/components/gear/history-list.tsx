import { gearConditionLabels, type GearCondition } from "@/lib/gear/kinds";
import { formatInZone } from "@/lib/time";
import type { HistoryEntryDto } from "@/server/services/lending";

const eventLabels: Record<string, string> = {
  request: "Requested",
  approve: "Approved",
  decline: "Declined",
  "hand-out": "Handed out",
  return: "Returned",
  cancel: "Cancelled",
  "co-sign": "Co-signed by a mentor",
  "mark-lost": "Marked lost",
  "item-added": "Added to the shelf",
  "item-edited": "Edited",
  "item-retired": "Retired",
  "item-restored": "Back on the shelf",
  "condition-changed": "Condition changed",
  "photo-added": "Photo added",
  "manual-added": "Manual added",
  "photo-removed": "Photo removed",
  "manual-removed": "Manual removed",
  "waitlist-joined": "Joined the waitlist",
  "waitlist-offered": "Offered to the next in line",
  "waitlist-accepted": "Waitlist offer accepted",
  "waitlist-lapsed": "Waitlist offer lapsed",
  "waitlist-withdrawn": "Left the waitlist",
};

export function HistoryList({ entries, timeZone }: { entries: HistoryEntryDto[]; timeZone: string }) {
  if (entries.length === 0) return <p className="text-slate-600">Nothing has happened to this item yet.</p>;
  return (
    <ol className="divide-y divide-slate-200" aria-label="Item history">
      {entries.map((entry) => (
        <li key={entry.id} className="py-2" data-testid="history-entry">
          <p>
            <span className="font-bold">{eventLabels[entry.event] ?? entry.event}</span>
            {entry.fromState && entry.toState && entry.fromState !== entry.toState && (
              <span className="text-slate-700">
                {" "}
                ({entry.fromState} → {entry.toState})
              </span>
            )}
            {entry.borrowerName && <span className="text-slate-700"> · loan of {entry.borrowerName}</span>}
          </p>
          <p className="text-sm text-slate-600">
            {formatInZone(entry.at, timeZone)} · {entry.actorName ?? "Guyline"}
            {entry.condition && ` · condition: ${gearConditionLabels[entry.condition as GearCondition]}`}
          </p>
          {entry.note && <p className="text-sm">{entry.note}</p>}
          {entry.fileUrl && (
            <a href={entry.fileUrl} className="text-sm">
              See the photo
            </a>
          )}
        </li>
      ))}
    </ol>
  );
}
