import Decimal from "decimal.js";
import {
  columnFilteringFeature,
  createColumnHelper,
  createFilteredRowModel,
  createSortedRowModel,
  filterFn_equalsString,
  filterFn_includesString,
  globalFilteringFeature,
  rowSortingFeature,
  sortFn_alphanumeric,
  sortFn_text,
  tableFeatures,
  type RowData,
  type SortFn,
} from "@tanstack/react-table";

/** Decimal strings ("12.5", null) compared exactly; empty cells sort last whatever the direction. */
// eslint-disable-next-line @typescript-eslint/no-explicit-any
const decimalSort: SortFn<any, any> = (a, b, id) => {
  const x = a.getValue<string | null>(id);
  const y = b.getValue<string | null>(id);
  if (x === y) return 0;
  if (x === null || x === undefined || x === "") return 1;
  if (y === null || y === undefined || y === "") return -1;
  return new Decimal(x).comparedTo(y);
};

/** What Barwright's tables can do: sort, filter by column, search across columns (TanStack Table v9). */
export const tableFeatureSet = tableFeatures({
  rowSortingFeature,
  columnFilteringFeature,
  globalFilteringFeature,
  sortedRowModel: createSortedRowModel(),
  filteredRowModel: createFilteredRowModel(),
  sortFns: { alphanumeric: sortFn_alphanumeric, text: sortFn_text, decimal: decimalSort },
  filterFns: { includesString: filterFn_includesString, equalsString: filterFn_equalsString },
});

export type TableFeatureSet = typeof tableFeatureSet;

/** A typed column helper for rows of type Row. */
export const columnsFor = <Row extends RowData>() => createColumnHelper<TableFeatureSet, Row>();
