"use client";
// Pieces shared by Guyline's server-side tables: a sortable column header and the pager.
// The tables themselves are TanStack Table instances; these only render what they are told.
import type { ReactNode } from "react";

export function SortButton({ label, sorted, onToggle }: { label: ReactNode; sorted: false | "asc" | "desc"; onToggle?: (event: unknown) => void }) {
  if (!onToggle) return <>{label}</>;
  return (
    <button type="button" onClick={onToggle} className="inline-flex min-h-11 items-center gap-1 font-bold text-slate-700 hover:text-copper-700">
      {label}
      <span aria-hidden="true">{sorted === "asc" ? "▲" : sorted === "desc" ? "▼" : "↕"}</span>
      <span className="sr-only">{sorted === "asc" ? "(sorted ascending)" : sorted === "desc" ? "(sorted descending)" : "(sort)"}</span>
    </button>
  );
}

export function Pager(props: {
  pageIndex: number;
  pageCount: number;
  rowCount: number;
  canPrevious: boolean;
  canNext: boolean;
  onPrevious: () => void;
  onNext: () => void;
  pageSize: number;
  onPageSize: (size: number) => void;
}) {
  return (
    <div className="mt-3 flex flex-wrap items-center gap-3 text-sm">
      <button type="button" className="min-h-11 rounded-lg border border-slate-400 bg-white px-3 font-bold disabled:text-slate-400" disabled={!props.canPrevious} onClick={props.onPrevious}>
        Previous page
      </button>
      <span aria-live="polite">
        Page {props.pageCount === 0 ? 0 : props.pageIndex + 1} of {props.pageCount} ({props.rowCount} in all)
      </span>
      <button type="button" className="min-h-11 rounded-lg border border-slate-400 bg-white px-3 font-bold disabled:text-slate-400" disabled={!props.canNext} onClick={props.onNext}>
        Next page
      </button>
      <label className="ml-auto flex items-center gap-2">
        Rows per page
        <select className="min-h-11 rounded-lg border border-slate-400 bg-white px-2" value={props.pageSize} onChange={(event) => props.onPageSize(Number(event.target.value))}>
          {[10, 20, 50, 100].map((size) => (
            <option key={size} value={size}>
              {size}
            </option>
          ))}
        </select>
      </label>
    </div>
  );
}
