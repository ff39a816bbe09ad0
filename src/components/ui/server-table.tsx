"use client";
// Guyline's server-side tables (the gear shelf, the loans): TanStack Table with sorting,
// filters and paging done by a route handler, read through TanStack Query. `useServerTable`
// keeps the table's state and turns it into the route's query string; `ServerTable` draws it.
import { keepPreviousData, useQuery } from "@tanstack/react-query";
import {
  columnFilteringFeature,
  rowPaginationFeature,
  rowSortingFeature,
  tableFeatures,
  useTable,
  type ColumnFiltersState,
  type PaginationState,
  type ReactTable,
  type SortingState,
  type TableOptions,
} from "@tanstack/react-table";
import { useState } from "react";
import { Pager, SortButton } from "./table-parts";

export const serverTableFeatures = tableFeatures({ rowSortingFeature, columnFilteringFeature, rowPaginationFeature });
type Features = typeof serverTableFeatures;
type QueryValue = string | number | boolean | undefined;
const noRows: never[] = [];

/** A query string without the empty, false and undefined values. */
export function queryString(params: Record<string, QueryValue>): string {
  const search = new URLSearchParams();
  for (const [key, value] of Object.entries(params)) if (value !== undefined && value !== "" && value !== false) search.set(key, String(value));
  return search.toString();
}

interface ServerTableSetup<Row extends { id: string }> {
  /** The TanStack Query key's first part; invalidating it refreshes the table. */
  queryKey: string;
  /** The route handler, e.g. "/api/gear"; it answers `{ rows, rowCount }` and `format=csv`. */
  endpoint: string;
  columns: TableOptions<Features, Row>["columns"];
  initialSort: { id: string; desc: boolean };
  /** Column filters by id, and the query parameter each is sent as. */
  filterParams: Record<string, string>;
  /** Other parameters the page's own controls set. */
  extraParams: Record<string, QueryValue>;
  /** What the table lists, for the message when loading fails ("the shelf"). */
  noun: string;
}

export function useServerTable<Row extends { id: string }>({ queryKey, endpoint, columns, initialSort, filterParams, extraParams, noun }: ServerTableSetup<Row>) {
  const [sorting, setSorting] = useState<SortingState>([initialSort]);
  const [columnFilters, setColumnFilters] = useState<ColumnFiltersState>([]);
  const [pagination, setPagination] = useState<PaginationState>({ pageIndex: 0, pageSize: 20 });

  const filterValue = (id: string) => (columnFilters.find((filter) => filter.id === id)?.value as string | undefined) ?? "";
  const setFilter = (id: string, value: string) => setColumnFilters((filters) => [...filters.filter((filter) => filter.id !== id), ...(value ? [{ id, value }] : [])]);

  const filters = Object.fromEntries(Object.entries(filterParams).map(([id, param]) => [param, filterValue(id)]));
  const params = {
    sort: sorting[0]?.id ?? initialSort.id,
    dir: sorting[0]?.desc ? "desc" : "asc",
    ...filters,
    ...extraParams,
  };
  // A new sort, filter or page control (once its value settles) starts again at the first page.
  // Adjusted while rendering, as React advises for state that follows other values, so the old
  // page of the new rows is never fetched.
  const paramsKey = JSON.stringify(params);
  const [pagedParamsKey, setPagedParamsKey] = useState(paramsKey);
  if (pagedParamsKey !== paramsKey) {
    setPagedParamsKey(paramsKey);
    setPagination((page) => ({ ...page, pageIndex: 0 }));
  }
  const pageParams = { page: pagination.pageIndex + 1, pageSize: pagination.pageSize };

  const result = useQuery({
    queryKey: [queryKey, params, pageParams],
    queryFn: async (): Promise<{ rows: Row[]; rowCount: number }> => {
      const response = await fetch(`${endpoint}?${queryString({ ...params, ...pageParams })}`);
      if (!response.ok) throw new Error((await response.json()).message ?? `${noun} could not be loaded.`);
      return response.json();
    },
    placeholderData: keepPreviousData,
  });

  const table = useTable({
    features: serverTableFeatures,
    columns,
    // One empty array for every render: a new one each time would make the table recompute.
    data: result.data?.rows ?? noRows,
    rowCount: result.data?.rowCount ?? 0,
    getRowId: (row) => row.id,
    state: { sorting, columnFilters, pagination },
    onSortingChange: setSorting,
    onColumnFiltersChange: setColumnFilters,
    onPaginationChange: setPagination,
    manualSorting: true,
    manualFiltering: true,
    manualPagination: true,
    enableSortingRemoval: false,
  });

  return {
    table,
    result,
    pagination,
    filterValue,
    setFilter,
    /** The same rows, every page, as CSV. */
    csvHref: `${endpoint}?${queryString({ ...params, format: "csv" })}`,
  };
}

interface ServerTableProps<Row extends { id: string }> {
  table: ReactTable<Features, Row>;
  result: { data?: { rows: Row[]; rowCount: number }; isError: boolean; error: Error | null; isPending: boolean; isFetching: boolean };
  pagination: PaginationState;
  /** "items", "loans": for the loading and the empty lines. */
  plural: string;
  rowTestId?: (row: Row) => string;
}

export function ServerTable<Row extends { id: string }>({ table, result, pagination, plural, rowTestId }: ServerTableProps<Row>) {
  return (
    <>
      {result.isError && <p role="alert" className="font-bold text-danger-600">{result.error?.message}</p>}
      {result.isPending && <p className="mt-3 text-slate-600" role="status">Loading the {plural}…</p>}
      <div className="mt-3 overflow-x-auto">
        <table className="w-full text-left" aria-busy={result.isFetching}>
          <thead>
            {table.getHeaderGroups().map((group) => (
              <tr key={group.id} className="border-b border-slate-300 text-sm">
                {group.headers.map((header) => {
                  const sorted = header.column.getIsSorted();
                  return (
                    <th key={header.id} scope="col" className="py-1 pr-3" aria-sort={sorted === "asc" ? "ascending" : sorted === "desc" ? "descending" : undefined}>
                      <SortButton label={<table.FlexRender header={header} />} sorted={sorted} onToggle={header.column.getCanSort() ? header.column.getToggleSortingHandler() : undefined} />
                    </th>
                  );
                })}
              </tr>
            ))}
          </thead>
          <tbody>
            {table.getRowModel().rows.map((row) => (
              <tr key={row.id} className="border-b border-slate-200 align-top" data-testid={rowTestId?.(row.original)}>
                {row.getAllCells().map((cell) => (
                  <td key={cell.id} className="py-2 pr-3">
                    <table.FlexRender cell={cell} />
                  </td>
                ))}
              </tr>
            ))}
          </tbody>
        </table>
        {result.data && result.data.rows.length === 0 && <p className="py-4 text-slate-600">No {plural} match these filters.</p>}
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
    </>
  );
}

/** The look of a server-side table's filter controls. */
export const filterControlClass = "mt-1 block min-h-11 w-full rounded-lg border border-slate-400 bg-white px-2";

/** One filter of a server-side table: the empty first option means "no filter". */
export function FilterSelect(props: { label: string; anyLabel: string; value: string; options: { value: string; label: string }[]; onChange: (value: string) => void }) {
  return (
    <label className="block font-bold">
      {props.label}
      <select className={filterControlClass} value={props.value} onChange={(event) => props.onChange(event.target.value)}>
        <option value="">{props.anyLabel}</option>
        {props.options.map((option) => (
          <option key={option.value} value={option.value}>
            {option.label}
          </option>
        ))}
      </select>
    </label>
  );
}

/** A yes/no filter beside the selects, e.g. "Overdue only". */
export function FilterCheckbox(props: { label: string; checked: boolean; onChange: (checked: boolean) => void }) {
  return (
    <label className="flex min-h-11 items-center gap-2 self-end font-bold">
      <input type="checkbox" className="size-5 accent-copper-700" checked={props.checked} onChange={(event) => props.onChange(event.target.checked)} />
      {props.label}
    </label>
  );
}
