"use client";

import { useTable, type ColumnDef, type ColumnFiltersState, type RowData, type SortingState } from "@tanstack/react-table";
import { useState, type ReactNode } from "react";
import { cn } from "@/lib/cn";
import { tableFeatureSet, type TableFeatureSet } from "./features";

/** A column's `meta`: `numeric` right-aligns tabular figures; `nowrap` keeps a short value (a date) on one line. */
export type ColumnLook = { numeric?: boolean; nowrap?: boolean };

/**
 * A sortable, searchable, filterable table (TanStack Table v9) in our table
 * style. The caller owns the search box and column filters (so they can live
 * in a toolbar) and passes them in; sorting is kept here.
 */
export function DataTable<Row extends RowData>({
  data,
  columns,
  search = "",
  columnFilters,
  empty,
  rowTestId,
  caption,
}: {
  data: Row[];
  // eslint-disable-next-line @typescript-eslint/no-explicit-any
  columns: ColumnDef<TableFeatureSet, Row, any>[];
  search?: string;
  columnFilters?: ColumnFiltersState;
  empty: ReactNode;
  rowTestId?: (row: Row) => string;
  caption?: string;
}) {
  const [sorting, setSorting] = useState<SortingState>([]);
  const table = useTable({
    features: tableFeatureSet,
    columns,
    data,
    state: { sorting, globalFilter: search, columnFilters: columnFilters ?? [] },
    onSortingChange: setSorting,
    globalFilterFn: "includesString",
  });
  const rows = table.getRowModel().rows;
  return (
    // Positioned, so that a visually hidden caption stays inside the scrolling box.
    <div className="relative overflow-x-auto rounded-card border border-sand bg-white">
      <table className="w-full border-collapse text-sm">
        {caption ? <caption className="sr-only">{caption}</caption> : null}
        <thead>
          {table.getHeaderGroups().map((group) => (
            <tr key={group.id}>
              {group.headers.map((header) => {
                const numeric = (header.column.columnDef.meta as ColumnLook | undefined)?.numeric;
                const sorted = header.column.getIsSorted();
                return (
                  <th
                    key={header.id}
                    scope="col"
                    aria-sort={sorted === "asc" ? "ascending" : sorted === "desc" ? "descending" : undefined}
                    className={cn(
                      "border-b border-sand bg-cream-deep px-4 py-2.5 text-left text-xs font-semibold uppercase tracking-wide text-cocoa-500",
                      numeric && "text-right",
                    )}
                  >
                    {header.isPlaceholder ? null : header.column.getCanSort() ? (
                      <button
                        type="button"
                        onClick={header.column.getToggleSortingHandler()}
                        className={cn("inline-flex items-center gap-1 uppercase hover:text-cocoa", numeric && "flex-row-reverse")}
                      >
                        <table.FlexRender header={header} />
                        <span aria-hidden className="text-cocoa-300">
                          {sorted === "asc" ? "▲" : sorted === "desc" ? "▼" : "↕"}
                        </span>
                      </button>
                    ) : (
                      <table.FlexRender header={header} />
                    )}
                  </th>
                );
              })}
            </tr>
          ))}
        </thead>
        <tbody>
          {rows.length === 0 ? (
            <tr>
              <td colSpan={columns.length} className="px-4 py-6 text-center text-cocoa-500">
                {empty}
              </td>
            </tr>
          ) : (
            rows.map((row) => (
              <tr key={row.id} data-testid={rowTestId?.(row.original)} className="hover:bg-cream/60">
                {row.getAllCells().map((cell) => {
                  const meta = cell.column.columnDef.meta as ColumnLook | undefined;
                  return (
                    <td
                      key={cell.id}
                      className={cn("border-b border-sand-light px-4 py-2.5", meta?.numeric && "figures whitespace-nowrap text-right", meta?.nowrap && "whitespace-nowrap")}
                    >
                      <table.FlexRender cell={cell} />
                    </td>
                  );
                })}
              </tr>
            ))
          )}
        </tbody>
      </table>
    </div>
  );
}
