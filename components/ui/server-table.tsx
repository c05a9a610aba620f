"use client";

// The parts every server-paged table shares (the commissions table, the payments ledger): TanStack
// Table v9 with manual sorting and paging, its state derived from the URL view and every change sent
// back to it; sortable column headers, the body rows and the pager under the table.
import { rowPaginationFeature, rowSortingFeature, tableFeatures, useTable, type ColumnDef, type ReactTable, type RowData, type SortingState, type Updater } from "@tanstack/react-table";
import { useMemo } from "react";
import { TBody, Td, Th, THead } from "./table";

export const serverTableFeatures = tableFeatures({
  rowSortingFeature,
  rowPaginationFeature,
});
export type ServerTableFeatures = typeof serverTableFeatures;
// eslint-disable-next-line @typescript-eslint/no-explicit-any
export type ServerTableColumns<T extends RowData> = ColumnDef<ServerTableFeatures, T, any>[];
type ServerTable<T extends RowData> = ReactTable<ServerTableFeatures, T>;

export interface ServerTableOptions<T extends RowData> {
  columns: ServerTableColumns<T>;
  rows: T[];
  total: number;
  sorting: SortingState;
  page: number;
  pageSize: number;
  onSort: (sorting: SortingState) => void;
  onPage: (change: { page: number; pageSize: number }) => void;
}

/** One sort column at a time, never unsorted; the server does the sorting and the paging. */
export function useServerTable<T extends RowData>({ columns, rows, total, sorting, page, pageSize, onSort, onPage }: ServerTableOptions<T>): ServerTable<T> {
  const pagination = useMemo(() => ({ pageIndex: page - 1, pageSize }), [page, pageSize]);
  return useTable({
    features: serverTableFeatures,
    columns,
    data: rows,
    rowCount: total,
    manualSorting: true,
    manualPagination: true,
    enableSortingRemoval: false,
    enableMultiSort: false,
    state: { sorting, pagination },
    onSortingChange: (u: Updater<SortingState>) => onSort(typeof u === "function" ? u(sorting) : u),
    onPaginationChange: (u) => {
      const next = typeof u === "function" ? u(pagination) : u;
      onPage({ page: next.pageIndex + 1, pageSize: next.pageSize });
    },
  });
}

/** Column headers; a sortable one is a button showing its direction, with aria-sort on the cell. */
export function SortableHead<T extends RowData>({ table, numeric }: { table: ServerTable<T>; numeric: ReadonlySet<string> }) {
  return (
    <THead>
      {table.getHeaderGroups().map((group) => (
        <tr key={group.id}>
          {group.headers.map((header) => {
            const sorted = header.column.getIsSorted();
            const canSort = header.column.getCanSort();
            return (
              <Th
                key={header.id}
                aria-sort={sorted === "asc" ? "ascending" : sorted === "desc" ? "descending" : canSort ? "none" : undefined}
                className={numeric.has(header.column.id) ? "text-right" : undefined}
              >
                {canSort ? (
                  <button type="button" onClick={header.column.getToggleSortingHandler()} className="inline-flex items-center gap-1 uppercase tracking-wider hover:text-rosewood-700">
                    <table.FlexRender header={header} />
                    <span aria-hidden className="font-mono">
                      {sorted === "asc" ? "▲" : sorted === "desc" ? "▼" : "↕"}
                    </span>
                  </button>
                ) : (
                  <table.FlexRender header={header} />
                )}
              </Th>
            );
          })}
        </tr>
      ))}
    </THead>
  );
}

export function BodyRows<T extends RowData>({ table, numeric }: { table: ServerTable<T>; numeric: ReadonlySet<string> }) {
  return (
    <TBody>
      {table.getRowModel().rows.map((row) => (
        <tr key={row.id} className="hover:bg-spruce-50">
          {row.getAllCells().map((cell) => (
            <Td key={cell.id} numeric={numeric.has(cell.column.id)}>
              <table.FlexRender cell={cell} />
            </Td>
          ))}
        </tr>
      ))}
    </TBody>
  );
}

/** "Showing 11–20 of 24" and Previous / Next; `empty` is said when there is nothing at all. */
export function Pager<T extends RowData>({ table, page, pageSize, total, empty }: { table: ServerTable<T>; page: number; pageSize: number; total: number; empty: string }) {
  const from = total === 0 ? 0 : (page - 1) * pageSize + 1;
  const to = Math.min(total, page * pageSize);
  const button = "h-9 rounded-chip border border-spruce-300 bg-white px-3 font-semibold disabled:opacity-40";
  return (
    <nav aria-label="Pages" className="flex flex-wrap items-center justify-between gap-3 text-sm">
      <p role="status" aria-live="polite">
        {total === 0 ? empty : `Showing ${from}–${to} of ${total}`}
      </p>
      <div className="flex items-center gap-2">
        <button type="button" className={button} onClick={() => table.previousPage()} disabled={!table.getCanPreviousPage()}>
          Previous
        </button>
        <span className="font-mono tabular">
          Page {page} of {Math.max(1, table.getPageCount())}
        </span>
        <button type="button" className={button} onClick={() => table.nextPage()} disabled={!table.getCanNextPage()}>
          Next
        </button>
      </div>
    </nav>
  );
}
