/** Helpers for the workspace export/import tests: calling the two route handlers and comparing exports. */
import { expect } from "vitest";
import { GET as exportRoute } from "@/app/api/workspace/export/route";
import { POST as importRoute } from "@/app/api/workspace/import/route";
import type { ExportDocument, Row } from "@/lib/workspace-transfer/format";
import { EXPORTED_TABLES } from "@/lib/workspace-transfer/tables";
import { formRequest } from "./ingredients";
import { base, params } from "./matrix";

export type Doc = ExportDocument & { tables: Record<string, Row[]> };

/** GET /api/workspace/export as the signed-in test user. */
export async function downloadExport(files: "include" | "reference" = "include"): Promise<{ status: number; text: string; headers: Headers }> {
  const res = await exportRoute(new Request(`${base}/api/workspace/export?files=${files}`), params());
  return { status: res.status, text: await res.text(), headers: res.headers };
}

/** POST /api/workspace/import with a file, as the signed-in test user. */
export async function uploadExport(content: string | Uint8Array, name = "export.json"): Promise<{ status: number; body: Record<string, unknown> }> {
  const bytes = typeof content === "string" ? new TextEncoder().encode(content) : content;
  const res = await importRoute(
    formRequest("/api/workspace/import", { file: new File([new Uint8Array(bytes)], name, { type: "application/json" }) }),
    params(),
  );
  return { status: res.status, body: (await res.json()) as Record<string, unknown> };
}

/**
 * Compares an export with the export of its import, row by row: every column
 * equal after mapping ids through `idMaps`, except what an import regenerates
 * (ids, the workspace id, a quote's dedupe key and an attachment's storage
 * key); author columns must name the importer where the person was the
 * importer, and be empty otherwise.
 */
export function expectSameContent(a: Doc, b: Doc, idMaps: Record<string, Record<string, string>>, importerEmail: string): void {
  const importerOld = new Set(a.people.filter((p) => p.email === importerEmail).map((p) => p.id));
  const importerNew = b.people.find((p) => p.email === importerEmail)?.id ?? null;
  for (const table of EXPORTED_TABLES) {
    const map = (target: string, value: unknown): unknown => {
      if (value === null) return null;
      if (target === "workspaces") return b.workspace.id;
      if (target === "users") return importerOld.has(String(value)) ? importerNew : null;
      return idMaps[target]?.[String(value)] ?? `unmapped ${target} ${String(value)}`;
    };
    const expected = a.tables[table.name]!.map((row) => {
      const out: Row = { ...row };
      if ("id" in row && idMaps[table.name]) out.id = idMaps[table.name]![String(row.id)];
      for (const ref of table.references) out[ref.key] = map(ref.target, row[ref.key]);
      // A quote's source names the price-list upload it came from, by id.
      if (table.name === "price_quotes" && upload.test(String(row.source))) {
        out.source = `price-list:${map("price_list_imports", String(row.source).replace(upload, ""))}`;
      }
      return normalise(table.name, out);
    });
    const actual = b.tables[table.name]!.map((row) => normalise(table.name, row));
    expect(sortRows(actual), table.name).toEqual(sortRows(expected));
  }
}

const upload = /^price-list:/;
function normalise(table: string, row: Row): Row {
  if (table === "price_quotes") return { ...row, dedupeKey: "(regenerated)" };
  if (table === "attachments") return { ...row, storageKey: "(regenerated)" };
  return row;
}

const sortRows = (rows: Row[]) => rows.map((r) => JSON.stringify(r, Object.keys(r).sort())).sort();
