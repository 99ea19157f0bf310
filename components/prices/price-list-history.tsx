"use client";

import useSWR from "swr";
import { fetchJson } from "@/components/data/fetch-json";
import { Table, Td, Th } from "@/components/ui/table";
import type { PriceListImportRecord } from "@/lib/data/price-list-imports";
import { formatDate } from "@/lib/format";

/** Past price-list uploads (newest first) with what became of their rows. */
export function PriceListHistory({ supplierId, showSupplier = false }: { supplierId?: string; showSupplier?: boolean }) {
  const { data } = useSWR(`/api/price-lists${supplierId ? `?supplierId=${supplierId}` : ""}`, fetchJson<{ imports: PriceListImportRecord[] }>);
  if (!data) return <div className="h-16 animate-pulse rounded-card bg-sand-light" />;
  if (data.imports.length === 0) return <p className="text-sm text-cocoa-500">No price list uploaded yet.</p>;
  return (
    <Table>
      <thead>
        <tr>
          <Th>Uploaded</Th>
          {showSupplier ? <Th>Supplier</Th> : null}
          <Th>File</Th>
          <Th numeric>Rows</Th>
          <Th numeric>Imported</Th>
          <Th numeric>Already known</Th>
          <Th numeric>Refused</Th>
        </tr>
      </thead>
      <tbody>
        {data.imports.map((i) => (
          <tr key={i.id}>
            <Td>
              {formatDate(i.createdAt)}
              {i.createdByName ? <span className="block text-xs text-cocoa-500">{i.createdByName}</span> : null}
            </Td>
            {showSupplier ? <Td>{i.supplierName}</Td> : null}
            <Td>
              {i.fileName}
              <span className="block text-xs text-cocoa-500">{i.encoding}</span>
            </Td>
            <Td numeric>{i.rowCount}</Td>
            <Td numeric>{i.importedCount}</Td>
            <Td numeric>{i.duplicateCount}</Td>
            <Td numeric className={i.invalidCount ? "text-brick" : undefined}>{i.invalidCount}</Td>
          </tr>
        ))}
      </tbody>
    </Table>
  );
}
