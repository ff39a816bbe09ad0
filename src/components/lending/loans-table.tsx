"use client";
// The loans: a TanStack Table over /api/bookings, sorted, filtered and paged by the server.
// Keepers see everyone's bookings; everyone else the server limits to their own.
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
import { StateBadge } from "@/components/gear/badges";
import { Pager, SortButton } from "@/components/ui/table-parts";
import { gearKindLabels, gearKinds } from "@/lib/gear/kinds";
import { bookingStateLabels, bookingStates } from "@/lib/lending/states";
import { formatInZone } from "@/lib/time";
import type { BookingDto, BookingPage } from "@/server/services/lending";

const features = tableFeatures({ rowSortingFeature, columnFilteringFeature, rowPaginationFeature });
const helper = createColumnHelper<typeof features, BookingDto>();
const emptyRows: BookingDto[] = [];

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
  const [sorting, setSorting] = useState<SortingState>([{ id: "startsAt", desc: true }]);
  const [columnFilters, setColumnFilters] = useState<ColumnFiltersState>([]);
  const [pagination, setPagination] = useState<PaginationState>({ pageIndex: 0, pageSize: 20 });
  const [overdueOnly, setOverdueOnly] = useState(false);

  const filterValue = (id: string) => (columnFilters.find((filter) => filter.id === id)?.value as string | undefined) ?? "";
  const setFilter = (id: string, value: string) => {
    setColumnFilters((filters) => [...filters.filter((filter) => filter.id !== id), ...(value ? [{ id, value }] : [])]);
    setPagination((page) => ({ ...page, pageIndex: 0 }));
  };
  const params: Record<string, string> = {
    page: String(pagination.pageIndex + 1),
    pageSize: String(pagination.pageSize),
    sort: sorting[0]?.id ?? "startsAt",
    dir: sorting[0]?.desc ? "desc" : "asc",
  };
  for (const [key, value] of [["state", filterValue("state")], ["kind", filterValue("kind")], ["borrowerId", filterValue("borrower")], ["overdue", overdueOnly ? "true" : ""]]) {
    if (value) params[key] = value;
  }
  const search = new URLSearchParams(params).toString();
  const result = useQuery({
    queryKey: ["bookings", params],
    queryFn: async (): Promise<BookingPage> => {
      const response = await fetch(`/api/bookings?${search}`);
      if (!response.ok) throw new Error((await response.json()).message ?? "The loans could not be loaded.");
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
  const exportParams = new URLSearchParams(params);
  exportParams.delete("page");
  exportParams.delete("pageSize");
  exportParams.set("format", "csv");

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
              setPagination((page) => ({ ...page, pageIndex: 0 }));
            }}
          />
          Overdue only
        </label>
      </div>
      <p className="mt-3 text-sm">
        <a href={`/api/bookings?${exportParams.toString()}`} download>
          Download these loans as CSV
        </a>
      </p>
      {result.isError && <p role="alert" className="font-bold text-danger-600">{result.error.message}</p>}
      {result.isPending && <p className="mt-3 text-slate-600" role="status">Loading the loans…</p>}
      <div className="mt-3 overflow-x-auto">
        <table className="w-full text-left" aria-busy={result.isFetching}>
          <thead>
            {table.getHeaderGroups().map((group) => (
              <tr key={group.id} className="border-b border-slate-300 text-sm">
                {group.headers.map((header) => (
                  <th key={header.id} scope="col" className="py-1 pr-3">
                    <SortButton label={<table.FlexRender header={header} />} sorted={header.column.getIsSorted()} onToggle={header.column.getCanSort() ? header.column.getToggleSortingHandler() : undefined} />
                  </th>
                ))}
              </tr>
            ))}
          </thead>
          <tbody>
            {table.getRowModel().rows.map((row) => (
              <tr key={row.id} className="border-b border-slate-200 align-top">
                {row.getAllCells().map((cell) => (
                  <td key={cell.id} className="py-2 pr-3">
                    <table.FlexRender cell={cell} />
                  </td>
                ))}
              </tr>
            ))}
          </tbody>
        </table>
        {result.data && result.data.rows.length === 0 && <p className="py-4 text-slate-600">No loans match these filters.</p>}
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
