"use client";
// The gear shelf: a TanStack Table over /api/gear, sorted, filtered and paged by the server.
import { keepPreviousData, useQuery } from "@tanstack/react-query";
import {
  columnFilteringFeature,
  createColumnHelper,
  rowPaginationFeature,
  rowSortingFeature,
  tableFeatures,
  useTable,
  type ColumnFiltersState,
  type PaginationState,
  type SortingState,
} from "@tanstack/react-table";
import Link from "next/link";
import { useMemo, useState } from "react";
import { Pager, SortButton } from "@/components/ui/table-parts";
import { gearConditionLabels, gearConditions, gearKindLabels, gearKinds, type GearCondition, type GearKind } from "@/lib/gear/kinds";
import { formatInZone } from "@/lib/time";
import type { GearListRow, GearPage } from "@/server/services/gear";
import { ConditionBadge } from "./badges";
import { detailSummary } from "./describe";

const features = tableFeatures({ rowSortingFeature, columnFilteringFeature, rowPaginationFeature });
const helper = createColumnHelper<typeof features, GearListRow>();
const emptyRows: GearListRow[] = [];

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

function queryString(params: Record<string, string | number | boolean | undefined>): string {
  const search = new URLSearchParams();
  for (const [key, value] of Object.entries(params)) if (value !== undefined && value !== "" && value !== false) search.set(key, String(value));
  return search.toString();
}

export function ShelfTable({ timeZone }: { timeZone: string }) {
  const columns = useMemo(() => buildColumns(timeZone), [timeZone]);
  const [sorting, setSorting] = useState<SortingState>([{ id: "labelCode", desc: false }]);
  const [columnFilters, setColumnFilters] = useState<ColumnFiltersState>([]);
  const [pagination, setPagination] = useState<PaginationState>({ pageIndex: 0, pageSize: 20 });
  const [availableOn, setAvailableOn] = useState("");
  const [search, setSearch] = useState("");
  const [includeRetired, setIncludeRetired] = useState(false);

  const filterValue = (id: string) => (columnFilters.find((filter) => filter.id === id)?.value as string | undefined) ?? "";
  const setFilter = (id: string, value: string) => {
    setColumnFilters((filters) => [...filters.filter((filter) => filter.id !== id), ...(value ? [{ id, value }] : [])]);
    setPagination((page) => ({ ...page, pageIndex: 0 }));
  };

  const params = {
    page: pagination.pageIndex + 1,
    pageSize: pagination.pageSize,
    sort: sorting[0]?.id ?? "labelCode",
    dir: sorting[0]?.desc ? "desc" : "asc",
    kind: filterValue("kind"),
    condition: filterValue("condition"),
    availableOn,
    q: search.trim(),
    includeRetired,
  };
  const result = useQuery({
    queryKey: ["gear", params],
    queryFn: async (): Promise<GearPage> => {
      const response = await fetch(`/api/gear?${queryString(params)}`);
      if (!response.ok) throw new Error((await response.json()).message ?? "The shelf could not be loaded.");
      return response.json();
    },
    placeholderData: keepPreviousData,
  });

  const table = useTable({
    features,
    columns,
    data: result.data?.rows ?? emptyRows,
    rowCount: result.data?.rowCount ?? 0,
    getRowId: (row) => row.id,
    state: { sorting, columnFilters, pagination },
    onSortingChange: (updater) => {
      setSorting(updater);
      setPagination((page) => ({ ...page, pageIndex: 0 }));
    },
    onColumnFiltersChange: setColumnFilters,
    onPaginationChange: setPagination,
    manualSorting: true,
    manualFiltering: true,
    manualPagination: true,
    enableSortingRemoval: false,
  });

  const sortable = new Set(["labelCode", "name", "kind", "condition", "location"]);
  return (
    <div>
      <div className="grid gap-3 sm:grid-cols-2 lg:grid-cols-5" role="search" aria-label="Filter the shelf">
        <label className="block font-bold">
          Kind
          <select className="mt-1 block min-h-11 w-full rounded-lg border border-slate-400 bg-white px-2" value={filterValue("kind")} onChange={(event) => setFilter("kind", event.target.value)}>
            <option value="">All kinds</option>
            {gearKinds.map((kind: GearKind) => (
              <option key={kind} value={kind}>
                {gearKindLabels[kind]}
              </option>
            ))}
          </select>
        </label>
        <label className="block font-bold">
          Condition
          <select className="mt-1 block min-h-11 w-full rounded-lg border border-slate-400 bg-white px-2" value={filterValue("condition")} onChange={(event) => setFilter("condition", event.target.value)}>
            <option value="">Any condition</option>
            {gearConditions.map((condition: GearCondition) => (
              <option key={condition} value={condition}>
                {gearConditionLabels[condition]}
              </option>
            ))}
          </select>
        </label>
        <label className="block font-bold">
          Free all day on
          <input
            type="date"
            className="mt-1 block min-h-11 w-full rounded-lg border border-slate-400 bg-white px-2"
            value={availableOn}
            onChange={(event) => {
              setAvailableOn(event.target.value);
              setPagination((page) => ({ ...page, pageIndex: 0 }));
            }}
          />
        </label>
        <label className="block font-bold">
          Search
          <input
            type="search"
            placeholder="Name, label or place"
            className="mt-1 block min-h-11 w-full rounded-lg border border-slate-400 bg-white px-2"
            value={search}
            onChange={(event) => {
              setSearch(event.target.value);
              setPagination((page) => ({ ...page, pageIndex: 0 }));
            }}
          />
        </label>
        <label className="flex min-h-11 items-center gap-2 self-end font-bold">
          <input type="checkbox" className="size-5 accent-copper-700" checked={includeRetired} onChange={(event) => setIncludeRetired(event.target.checked)} />
          Show retired items
        </label>
      </div>
      <p className="mt-3 text-sm">
        <a href={`/api/gear?${queryString({ ...params, page: undefined, pageSize: undefined, format: "csv" })}`} download>
          Download these items as CSV
        </a>
      </p>
      {result.isError && <p role="alert" className="font-bold text-danger-600">{result.error.message}</p>}
      {result.isPending && <p className="mt-3 text-slate-600" role="status">Loading the items…</p>}
      <div className="mt-3 overflow-x-auto">
        <table className="w-full text-left" aria-busy={result.isFetching}>
          <thead>
            {table.getHeaderGroups().map((group) => (
              <tr key={group.id} className="border-b border-slate-300 text-sm">
                {group.headers.map((header) => (
                  <th key={header.id} scope="col" className="py-1 pr-3" aria-sort={header.column.getIsSorted() === "asc" ? "ascending" : header.column.getIsSorted() === "desc" ? "descending" : undefined}>
                    <SortButton
                      label={<table.FlexRender header={header} />}
                      sorted={header.column.getIsSorted()}
                      onToggle={sortable.has(header.column.id) ? header.column.getToggleSortingHandler() : undefined}
                    />
                  </th>
                ))}
              </tr>
            ))}
          </thead>
          <tbody>
            {table.getRowModel().rows.map((row) => (
              <tr key={row.id} className="border-b border-slate-200 align-top" data-testid={`gear-row-${row.original.labelCode}`}>
                {row.getAllCells().map((cell) => (
                  <td key={cell.id} className="py-2 pr-3">
                    <table.FlexRender cell={cell} />
                  </td>
                ))}
              </tr>
            ))}
          </tbody>
        </table>
        {result.data && result.data.rows.length === 0 && <p className="py-4 text-slate-600">No items match these filters.</p>}
      </div>
      <Pager
        pageIndex={pagination.pageIndex}
        pageCount={table.getPageCount()}
        rowCount={result.data?.rowCount ?? 0}
        canPrevious={table.getCanPreviousPage()}
        canNext={table.getCanNextPage()}
        onPrevious={() => table.previousPage()}
        onNext={() => table.nextPage()}
        pageSize={pagination.pageSize}
        onPageSize={(size) => table.setPageSize(size)}
      />
    </div>
  );
}
