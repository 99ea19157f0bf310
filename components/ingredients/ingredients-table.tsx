"use client";

import Link from "next/link";
import { useMemo, useState } from "react";
import useSWR from "swr";
import { fetchJson } from "@/components/data/fetch-json";
import { perKg } from "@/components/data/money";
import { DataTable } from "@/components/tables/data-table";
import { columnsFor } from "@/components/tables/features";
import { TableToolbar } from "@/components/tables/table-toolbar";
import { Badge } from "@/components/ui/badge";
import type { IngredientListRow } from "@/lib/cost-visibility/ingredients";
import { allergenLabel } from "@/lib/ingredients/allergens";
import { KIND_LABELS, kindOptions } from "@/lib/ingredients/kinds";
import { formatNumber } from "@/lib/format";

type Row = IngredientListRow;

const col = columnsFor<Row>();
const allColumns = [
  col.accessor("name", {
    header: "Ingredient",
    sortFn: "text",
    cell: (c) => (
      <Link href={`/ingredients/${c.row.original.id}`} className="font-semibold text-pod-dark underline-offset-2 hover:underline">
        {c.getValue()}
        {c.row.original.archived ? <Badge className="ml-2">archived</Badge> : null}
      </Link>
    ),
  }),
  col.accessor((r) => KIND_LABELS[r.kind], { id: "kind", header: "Kind", sortFn: "text", filterFn: "equalsString" }),
  col.accessor("cocoaButter", { header: "Cocoa butter g/100 g", sortFn: "decimal", meta: { numeric: true }, cell: (c) => formatNumber(c.getValue(), 1), enableGlobalFilter: false }),
  col.accessor("sugar", { header: "Sugar g/100 g", sortFn: "decimal", meta: { numeric: true }, cell: (c) => formatNumber(c.getValue(), 1), enableGlobalFilter: false }),
  col.accessor((r) => r.allergens.map(allergenLabel).join(", "), {
    id: "allergens",
    header: "Allergens",
    enableSorting: false,
    cell: (c) => c.getValue() || <span className="text-cocoa-300">none listed</span>,
  }),
  col.accessor((r) => r.preferredSupplierName ?? "", { id: "supplier", header: "Preferred supplier", sortFn: "text" }),
  col.accessor((r) => (r.currentPrice?.status === "priced" ? r.currentPrice.pricePerKg : null), {
    id: "price",
    header: "Current price",
    sortFn: "decimal",
    meta: { numeric: true },
    enableGlobalFilter: false,
    cell: (c) => {
      const p = c.row.original.currentPrice;
      if (p?.status === "priced") return perKg(p.pricePerKg, p.baseCurrency);
      return <span className="text-xs text-cocoa-500" title={p?.message}>no price</span>;
    },
  }),
];

/**
 * The ingredient library: search, filter by kind, include archived, sort; refreshed by SWR.
 * `showPrices` comes from the server's canSeeCosts; the API leaves prices out for the others anyway.
 */
export function IngredientsTable({ showPrices }: { showPrices: boolean }) {
  const [search, setSearch] = useState("");
  const [kind, setKind] = useState("all");
  const [archived, setArchived] = useState(false);
  const { data, error, isLoading } = useSWR(`/api/ingredients?archived=${archived ? "include" : "exclude"}`, fetchJson<{ ingredients: Row[]; pricesShown: boolean }>);
  const columns = useMemo(() => (showPrices ? allColumns : allColumns.filter((c) => c.id !== "price")), [showPrices]);
  const filters = useMemo(() => (kind === "all" ? [] : [{ id: "kind", value: KIND_LABELS[kind as keyof typeof KIND_LABELS] }]), [kind]);
  const rows = useMemo(() => data?.ingredients ?? [], [data]);
  return (
    <div className="space-y-3">
      <TableToolbar
        search={search}
        onSearch={setSearch}
        searchLabel="Search ingredients"
        filter={{ label: "Kind", value: kind, onChange: setKind, options: [{ value: "all", label: "All kinds" }, ...kindOptions] }}
        toggle={{ label: "Show archived", checked: archived, onChange: setArchived }}
      />
      {error ? (
        <p role="alert" className="rounded-lg bg-brick-light px-3 py-2 text-sm text-brick">
          The library could not be loaded: {error.message}
        </p>
      ) : (
        <DataTable
          data={rows}
          columns={columns}
          search={search}
          columnFilters={filters}
          caption="Ingredient library"
          rowTestId={(r) => `ingredient-${r.name}`}
          empty={isLoading ? "Loading…" : search || kind !== "all" ? "No ingredient matches." : "No ingredient yet."}
        />
      )}
    </div>
  );
}
