// One computed figure in a definition list: a label over a large number. `name` is the
// `data-figure` hook browser tests read the value by.
import type { ReactNode } from "react";

export function Figure({ name, label, children }: { name: string; label: string; children: ReactNode }) {
  return (
    <div className="rounded-lg border border-slate-200 p-3">
      <dt className="text-sm text-slate-700">{label}</dt>
      <dd className="text-lg font-bold tabular-nums text-slate-900" data-figure={name}>
        {children}
      </dd>
    </div>
  );
}
