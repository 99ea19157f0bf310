"use client";

import Link from "next/link";
import { useMemo, useState } from "react";
import useSWR from "swr";
import { fetchJson } from "@/components/data/fetch-json";
import { perKg, quotedPrice } from "@/components/data/money";
import { DataTable } from "@/components/tables/data-table";
import { columnsFor } from "@/components/tables/features";
import { TableToolbar } from "@/components/tables/table-toolbar";
import { Badge } from "@/components/ui/badge";
import type { QuoteRecord } from "@/lib/data/quotes";
import { formatDate } from "@/lib/format";

export type QuotesResponse = { baseCurrency: string; quotes: QuoteRecord[] };

/** The SWR key of a quote list; the history chart and the table share it, so one fetch serves both. */
export const quotesKey = (filter: { ingredientId?: string; supplierId?: string }) => {
  const q = new URLSearchParams(filter as Record<string, string>).toString();
  return `/api/quotes${q ? `?${q}` : ""}`;
};

const col = columnsFor<QuoteRecord & { base: string }>();
const link = (href: string, text: string) => (
  <Link href={href} className="font-semibold text-pod-dark underline-offset-2 hover:underline">
    {text}
  </Link>
);
const allColumns = [
  col.accessor("ingredientName", { id: "ingredient", header: "Ingredient", sortFn: "text", cell: (c) => link(`/ingredients/${c.row.original.ingredientId}`, c.getValue()) }),
  col.accessor("supplierName", { id: "supplier", header: "Supplier", sortFn: "text", cell: (c) => link(`/suppliers/${c.row.original.supplierId}`, c.getValue()) }),
  col.accessor((r) => quotedPrice(r), { id: "quoted", header: "Quoted", enableSorting: false }),
  col.accessor("perKgBase", {
    header: "Per kg at start",
    sortFn: "decimal",
    meta: { numeric: true },
    enableGlobalFilter: false,
    cell: (c) => (c.getValue() === null ? <span className="text-xs text-brick" title={c.row.original.conversionProblem ?? ""}>no rate</span> : perKg(c.getValue(), c.row.original.base)),
  }),
  col.accessor("validFrom", { header: "Valid from", sortFn: "alphanumeric", meta: { nowrap: true }, cell: (c) => formatDate(c.getValue()) }),
  col.accessor((r) => r.validUntil ?? "", { id: "validUntil", header: "Until", sortFn: "alphanumeric", meta: { nowrap: true }, cell: (c) => (c.getValue() ? formatDate(c.getValue()) : "open") }),
  col.accessor((r) => (r.current ? "current" : ""), {
    id: "status",
    header: "Status",
    filterFn: "equalsString",
    cell: (c) => (c.row.original.current ? <Badge tone="meets">current</Badge> : <span className="text-xs text-cocoa-500">history</span>),
  }),
  col.accessor((r) => (r.source.startsWith("price-list:") ? "price-list upload" : r.source === "manual" ? "typed in" : r.source), { id: "source", header: "Source" }),
];

/**
 * Quotes, history included, newest first: one ingredient's, one supplier's or
 * all. Sort, search, "current only". SWR keeps it fresh after an import.
 */
export function QuotesTable({ filter = {}, hide = [] }: { filter?: { ingredientId?: string; supplierId?: string }; hide?: ("ingredient" | "supplier")[] }) {
  const [search, setSearch] = useState("");
  const [currentOnly, setCurrentOnly] = useState(false);
  const { data, error, isLoading } = useSWR(quotesKey(filter), fetchJson<QuotesResponse>);
  const rows = useMemo(() => (data?.quotes ?? []).map((q) => ({ ...q, base: data!.baseCurrency })), [data]);
  const columns = useMemo(() => allColumns.filter((c) => !hide.includes(c.id as "ingredient" | "supplier")), [hide]);
  const filters = useMemo(() => (currentOnly ? [{ id: "status", value: "current" }] : []), [currentOnly]);
  if (error) return <p role="alert" className="rounded-lg bg-brick-light px-3 py-2 text-sm text-brick">Quotes could not be loaded: {error.message}</p>;
  return (
    <div className="space-y-3">
      <TableToolbar search={search} onSearch={setSearch} searchLabel="Search quotes" toggle={{ label: "Current only", checked: currentOnly, onChange: setCurrentOnly }} />
      <DataTable
        data={rows}
        columns={columns}
        search={search}
        columnFilters={filters}
        caption="Price quotes"
        rowTestId={(q) => `quote-${q.ingredientName}-${q.validFrom}`}
        empty={isLoading ? "Loading…" : "No quote yet."}
      />
    </div>
  );
}
