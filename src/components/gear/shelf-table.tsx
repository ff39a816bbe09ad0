"use client";
// The gear shelf: a server-side table over /api/gear, sorted, filtered and paged by the server.
import { createColumnHelper } from "@tanstack/react-table";
import Link from "next/link";
import { useEffect, useMemo, useState } from "react";
import { FilterCheckbox, FilterSelect, ServerTable, filterControlClass, serverTableFeatures, useServerTable } from "@/components/ui/server-table";
import { gearConditionLabels, gearConditions, gearKindLabels, gearKinds } from "@/lib/gear/kinds";
import { formatInZone } from "@/lib/time";
import type { GearListRow } from "@/server/services/gear";
import { ConditionBadge } from "./badges";
import { detailSummary } from "./describe";

/** The search asks the server once typing pauses, not on every keystroke. */
const SEARCH_DELAY_MS = 300;

/** The value once it has stayed the same for `delayMs`. */
function useSettledValue<T>(value: T, delayMs: number): T {
  const [settled, setSettled] = useState(value);
  useEffect(() => {
    const timer = setTimeout(() => setSettled(value), delayMs);
    return () => clearTimeout(timer);
  }, [value, delayMs]);
  return settled;
}

const helper = createColumnHelper<typeof serverTableFeatures, GearListRow>();

function availabilityText(row: GearListRow, timeZone: string): string {
  const { availability } = row;
  if (availability.status === "retired") return "Retired";
  if (availability.status === "free") return "Free";
  const until = availability.endsAt ? formatInZone(availability.endsAt, timeZone) : "";
  if (availability.status === "out") return `${availability.overdue ? "Overdue" : "Out"}: ${availability.borrowerName}, due ${until}`;
  return `Booked from ${availability.startsAt ? formatInZone(availability.startsAt, timeZone) : ""}`;
}

function buildColumns(timeZone: string) {
  return helper.columns([
    helper.accessor("labelCode", {
      header: "Label",
      cell: (info) => (
        <Link href={`/gear/${info.row.original.id}`} className="font-bold">
          {info.getValue()}
        </Link>
      ),
    }),
    helper.accessor("name", { header: "Name" }),
    helper.accessor("kind", { header: "Kind", cell: (info) => gearKindLabels[info.getValue()] }),
    helper.accessor("condition", { header: "Condition", cell: (info) => <ConditionBadge condition={info.getValue()} /> }),
    helper.accessor("location", { header: "Kept in" }),
    helper.display({ id: "details", header: "Details", cell: (info) => detailSummary(info.row.original) }),
    helper.display({
      id: "availability",
      header: "Now",
      cell: (info) => {
        const text = availabilityText(info.row.original, timeZone);
        return <span className={info.row.original.availability.overdue ? "font-bold text-danger-600" : undefined}>{text}</span>;
      },
    }),
  ]);
}

export function ShelfTable({ timeZone }: { timeZone: string }) {
  const columns = useMemo(() => buildColumns(timeZone), [timeZone]);
  const [availableOn, setAvailableOn] = useState("");
  const [search, setSearch] = useState("");
  const query = useSettledValue(search.trim(), SEARCH_DELAY_MS);
  const [includeRetired, setIncludeRetired] = useState(false);
  const { table, result, pagination, filterValue, setFilter, csvHref } = useServerTable({
    queryKey: "gear",
    endpoint: "/api/gear",
    columns,
    initialSort: { id: "labelCode", desc: false },
    filterParams: { kind: "kind", condition: "condition" },
    extraParams: { availableOn, q: query, includeRetired },
    noun: "The shelf",
  });

  return (
    <div>
      <div className="grid gap-3 sm:grid-cols-2 lg:grid-cols-5" role="search" aria-label="Filter the shelf">
        <FilterSelect label="Kind" anyLabel="All kinds" value={filterValue("kind")} options={gearKinds.map((kind) => ({ value: kind, label: gearKindLabels[kind] }))} onChange={(value) => setFilter("kind", value)} />
        <FilterSelect label="Condition" anyLabel="Any condition" value={filterValue("condition")} options={gearConditions.map((condition) => ({ value: condition, label: gearConditionLabels[condition] }))} onChange={(value) => setFilter("condition", value)} />
        <label className="block font-bold">
          Free all day on
          <input
            type="date"
            className={filterControlClass}
            value={availableOn}
            onChange={(event) => setAvailableOn(event.target.value)}
          />
        </label>
        <label className="block font-bold">
          Search
          <input
            type="search"
            placeholder="Name, label or place"
            className={filterControlClass}
            value={search}
            onChange={(event) => setSearch(event.target.value)}
          />
        </label>
        <FilterCheckbox
          label="Show retired items"
          checked={includeRetired}
          onChange={setIncludeRetired}
        />
      </div>
      <p className="mt-3 text-sm">
        <a href={csvHref} download>
          Download these items as CSV
        </a>
      </p>
      <ServerTable table={table} result={result} pagination={pagination} plural="items" rowTestId={(row) => `gear-row-${row.labelCode}`} />
    </div>
  );
}
