"use client";

import Link from "next/link";
import { useMemo, useState } from "react";
import useSWR from "swr";
import { fetchJson } from "@/components/data/fetch-json";
import { DataTable } from "@/components/tables/data-table";
import { columnsFor } from "@/components/tables/features";
import { TableToolbar } from "@/components/tables/table-toolbar";
import { Badge } from "@/components/ui/badge";
import type { SupplierSummary } from "@/lib/data/suppliers";

const col = columnsFor<SupplierSummary>();
const columns = [
  col.accessor("name", {
    header: "Supplier",
    sortFn: "text",
    cell: (c) => (
      <Link href={`/suppliers/${c.row.original.id}`} className="font-semibold text-pod-dark underline-offset-2 hover:underline">
        {c.getValue()}
        {c.row.original.archived ? <Badge className="ml-2">archived</Badge> : null}
      </Link>
    ),
  }),
  col.accessor((r) => r.contactName ?? "", { id: "contact", header: "Contact", sortFn: "text" }),
  col.accessor((r) => r.email ?? "", { id: "email", header: "E-mail", cell: (c) => (c.getValue() ? <a href={`mailto:${c.getValue()}`} className="hover:underline">{c.getValue()}</a> : "—") }),
  col.accessor("currency", { header: "Currency", sortFn: "text" }),
  col.accessor((r) => (r.leadTimeDays === null ? "" : String(r.leadTimeDays)), {
    id: "lead",
    header: "Lead time",
    sortFn: "decimal",
    meta: { numeric: true },
    enableGlobalFilter: false,
    cell: (c) => (c.getValue() ? `${c.getValue()} days` : "—"),
  }),
  col.accessor((r) => String(r.quoteCount), { id: "quotes", header: "Quotes", sortFn: "decimal", meta: { numeric: true }, enableGlobalFilter: false }),
];

/** The workspace's suppliers, searchable and sortable; archived ones on request. */
export function SuppliersTable() {
  const [search, setSearch] = useState("");
  const [archived, setArchived] = useState(false);
  const { data, error, isLoading } = useSWR(`/api/suppliers?archived=${archived ? "include" : "exclude"}`, fetchJson<{ suppliers: SupplierSummary[] }>);
  const rows = useMemo(() => data?.suppliers ?? [], [data]);
  return (
    <div className="space-y-3">
      <TableToolbar search={search} onSearch={setSearch} searchLabel="Search suppliers" toggle={{ label: "Show archived", checked: archived, onChange: setArchived }} />
      {error ? (
        <p role="alert" className="rounded-lg bg-brick-light px-3 py-2 text-sm text-brick">Suppliers could not be loaded: {error.message}</p>
      ) : (
        <DataTable data={rows} columns={columns} search={search} caption="Suppliers" rowTestId={(s) => `supplier-${s.name}`} empty={isLoading ? "Loading…" : "No supplier yet."} />
      )}
    </div>
  );
}
