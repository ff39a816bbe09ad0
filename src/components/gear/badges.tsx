import { gearConditionLabels, type GearCondition } from "@/lib/gear/kinds";
import { bookingStateLabels, type BookingState } from "@/lib/lending/states";

const badge = "inline-block rounded-full border px-2 py-0.5 text-sm font-bold";

export function ConditionBadge({ condition }: { condition: GearCondition }) {
  const tone = condition === "needs_repair" ? "border-caution-600 bg-caution-50 text-caution-800" : condition === "retired" ? "border-slate-400 bg-slate-100 text-slate-700" : "border-slate-300 bg-white text-slate-800";
  return <span className={`${badge} ${tone}`}>{gearConditionLabels[condition]}</span>;
}

export function StateBadge({ state, overdue }: { state: BookingState; overdue?: boolean }) {
  if (overdue) return <span className={`${badge} border-danger-600 bg-danger-50 text-danger-800`}>Overdue</span>;
  const tone = state === "out" ? "border-copper-600 bg-copper-50 text-copper-900" : state === "approved" ? "border-copper-300 bg-white text-copper-900" : state === "lost" ? "border-danger-600 bg-danger-50 text-danger-800" : "border-slate-300 bg-white text-slate-700";
  return <span className={`${badge} ${tone}`}>{bookingStateLabels[state]}</span>;
}
