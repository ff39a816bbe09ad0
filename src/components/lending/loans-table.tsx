"use client";
// The loans: a server-side table over /api/bookings, sorted, filtered and paged by the server.
// Keepers see everyone's bookings; everyone else the server limits to their own.
import { createColumnHelper } from "@tanstack/react-table";
import Link from "next/link";
import { useMemo, useState } from "react";
import { StateBadge } from "@/components/gear/badges";
import { ServerTable, serverTableFeatures, useServerTable } from "@/components/ui/server-table";
import { gearKindLabels, gearKinds } from "@/lib/gear/kinds";
import { bookingStateLabels, bookingStates } from "@/lib/lending/states";
import { formatInZone } from "@/lib/time";
import type { BookingDto } from "@/server/services/lending";

const helper = createColumnHelper<typeof serverTableFeatures, BookingDto>();

function buildColumns(timeZone: string) {
  return helper.columns([
    helper.accessor("itemLabelCode", {
      id: "item",
      header: "Item",
      cell: (info) => (
        <Link href={`/gear/${info.row.original.itemId}`}>
          <span className="font-bold">{info.getValue()}</span> {info.row.original.itemName}
        </Link>
      ),
    }),
    helper.accessor("borrowerName", { id: "borrower", header: "Borrower" }),
    helper.accessor("startsAt", { header: "From", cell: (info) => formatInZone(info.getValue(), timeZone) }),
    helper.accessor("endsAt", { header: "Until", cell: (info) => formatInZone(info.getValue(), timeZone) }),
    helper.accessor("state", { header: "State", cell: (info) => <StateBadge state={info.getValue()} overdue={info.row.original.overdue} /> }),
    helper.accessor("itemKind", { id: "kind", header: "Kind", enableSorting: false, cell: (info) => gearKindLabels[info.getValue()] }),
  ]);
}

const selectClass = "mt-1 block min-h-11 w-full rounded-lg border border-slate-400 bg-white px-2";

export function LoansTable({ timeZone, borrowers }: { timeZone: string; borrowers: { id: string; name: string }[] | null }) {
  const columns = useMemo(() => buildColumns(timeZone), [timeZone]);
  const [overdueOnly, setOverdueOnly] = useState(false);
  const { table, result, pagination, filterValue, setFilter, firstPage, csvHref } = useServerTable({
    queryKey: "bookings",
    endpoint: "/api/bookings",
    columns,
    initialSort: { id: "startsAt", desc: true },
    filterParams: { state: "state", kind: "kind", borrower: "borrowerId" },
    extraParams: { overdue: overdueOnly },
    noun: "The loans",
  });

  return (
    <div>
      <div className="grid gap-3 sm:grid-cols-2 lg:grid-cols-4" role="search" aria-label="Filter the loans">
        <label className="block font-bold">
          State
          <select className={selectClass} value={filterValue("state")} onChange={(event) => setFilter("state", event.target.value)}>
            <option value="">Any state</option>
            {bookingStates.map((state) => (
              <option key={state} value={state}>
                {bookingStateLabels[state]}
              </option>
            ))}
          </select>
        </label>
        <label className="block font-bold">
          Kind
          <select className={selectClass} value={filterValue("kind")} onChange={(event) => setFilter("kind", event.target.value)}>
            <option value="">All kinds</option>
            {gearKinds.map((kind) => (
              <option key={kind} value={kind}>
                {gearKindLabels[kind]}
              </option>
            ))}
          </select>
        </label>
        {borrowers && (
          <label className="block font-bold">
            Borrower
            <select className={selectClass} value={filterValue("borrower")} onChange={(event) => setFilter("borrower", event.target.value)}>
              <option value="">Everyone</option>
              {borrowers.map((person) => (
                <option key={person.id} value={person.id}>
                  {person.name}
                </option>
              ))}
            </select>
          </label>
        )}
        <label className="flex min-h-11 items-center gap-2 self-end font-bold">
          <input
            type="checkbox"
            className="size-5 accent-copper-700"
            checked={overdueOnly}
            onChange={(event) => {
              setOverdueOnly(event.target.checked);
              firstPage();
            }}
          />
          Overdue only
        </label>
      </div>
      <p className="mt-3 text-sm">
        <a href={csvHref} download>
          Download these loans as CSV
        </a>
      </p>
      <ServerTable table={table} result={result} pagination={pagination} plural="loans" />
    </div>
  );
}
