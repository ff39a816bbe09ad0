import { dayStatusLabels, type DayStatus } from "@/lib/antenna-days/status";

const tones: Record<DayStatus, string> = {
  draft: "border-slate-400 bg-white text-slate-700",
  published: "border-copper-700 bg-copper-700 text-white",
  done: "border-slate-600 bg-slate-600 text-white",
  cancelled: "border-slate-400 bg-slate-100 text-slate-700 line-through",
};

export function DayStatusBadge({ status }: { status: DayStatus }) {
  return <span className={`inline-block rounded-full border px-2 py-0.5 text-sm font-bold ${tones[status]}`}>{dayStatusLabels[status]}</span>;
}
