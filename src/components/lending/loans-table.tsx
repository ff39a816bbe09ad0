"use client";
// The loans: a server-side table over /api/bookings, sorted, filtered and paged by the server.
// Keepers see everyone's bookings; everyone else the server limits to their own.
import { createColumnHelper } from "@tanstack/react-table";
import Link from "next/link";
import { useMemo, useState } from "react";
import { StateBadge } from "@/components/gear/badges";
import { FilterCheckbox, FilterSelect, ServerTable, serverTableFeatures, useServerTable } from "@/components/ui/server-table";
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

export function LoansTable({ timeZone, borrowers }: { timeZone: string; borrowers: { id: string; name: string }[] | null }) {
  const columns = useMemo(() => buildColumns(timeZone), [timeZone]);
  const [overdueOnly, setOverdueOnly] = useState(false);
  const { table, result, pagination, filterValue, setFilter, csvHref } = useServerTable({
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
        <FilterSelect label="State" anyLabel="Any state" value={filterValue("state")} options={bookingStates.map((state) => ({ value: state, label: bookingStateLabels[state] }))} onChange={(value) => setFilter("state", value)} />
        <FilterSelect label="Kind" anyLabel="All kinds" value={filterValue("kind")} options={gearKinds.map((kind) => ({ value: kind, label: gearKindLabels[kind] }))} onChange={(value) => setFilter("kind", value)} />
        {borrowers && (
          <FilterSelect label="Borrower" anyLabel="Everyone" value={filterValue("borrower")} options={borrowers.map((person) => ({ value: person.id, label: person.name }))} onChange={(value) => setFilter("borrower", value)} />
        )}
        <FilterCheckbox
          label="Overdue only"
          checked={overdueOnly}
          onChange={setOverdueOnly}
        />
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
