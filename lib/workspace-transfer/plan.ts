import { randomUUID } from "node:crypto";
import { invalid } from "@/lib/errors";
import type { ExportDocument, FileEntry, Person, Row } from "./format";
import { ROW_FIXUPS, type IdMaps } from "./fixups";
import { EXPORTED_TABLES, type TableInfo } from "./tables";

export type Importer = { id: string; email: string };

export type ImportPlan = {
  workspace: Row;
  tables: { table: TableInfo; rows: Row[] }[];
  /** Old id → new id, per table. */
  idMaps: IdMaps;
  /** The file entries, one per attachment row. */
  files: FileEntry[];
  /** People of the file who do not come along (everyone but the importer). */
  skippedPeople: Person[];
};

const dateFormat = new Intl.DateTimeFormat("en-GB", { day: "numeric", month: "short", year: "numeric", timeZone: "UTC" });

/**
 * Turns a validated export into the rows of a new workspace: every row gets a
 * new id; every foreign key, soft reference and embedded id is rewritten
 * through the same maps, so rows keep pointing at each other. Author columns
 * point at the importer when the file's person is the importer (same e-mail),
 * else they are cleared: rows are never tied to someone else's account. Any
 * reference to a row not in the file refuses the whole import. Pure: the
 * caller writes the plan in one transaction.
 */
export function planImport(doc: ExportDocument, { importer, workspaceId, on }: { importer: Importer; workspaceId: string; on: Date }): ImportPlan {
  const people = new Map<string, string | null>();
  for (const person of doc.people) {
    if (people.has(person.id)) throw invalid(`The people list names the id ${person.id} twice. Nothing was imported.`);
    people.set(person.id, person.email.toLowerCase() === importer.email.toLowerCase() ? importer.id : null);
  }
  const oldWorkspaceId = String(doc.workspace.id);
  const tableRows = doc.tables as Record<string, Row[]>;
  const idMaps: IdMaps = {};
  for (const table of EXPORTED_TABLES) {
    if (table.primaryKey.length !== 1 || table.primaryKey[0] !== "id") continue;
    const map = new Map<string, string>();
    for (const row of tableRows[table.name]!) {
      const id = String(row.id);
      if (map.has(id)) throw invalid(`${table.name}: the id ${id} appears twice. Nothing was imported.`);
      map.set(id, randomUUID());
    }
    idMaps[table.name] = map;
  }

  const tables = EXPORTED_TABLES.map((table) => ({
    table,
    rows: tableRows[table.name]!.map((row, i) => {
      const where = `${table.name} row ${i + 1}`;
      if (table.workspaceKey && row[table.workspaceKey] !== oldWorkspaceId) {
        throw invalid(`${where} belongs to another workspace than the file's. Nothing was imported.`);
      }
      const out: Row = { ...row };
      if (idMaps[table.name]) out.id = idMaps[table.name]!.get(String(row.id));
      for (const ref of table.references) {
        const value = row[ref.key];
        if (value === null || value === undefined) continue;
        out[ref.key] = mapReference(String(value), ref.target, ref.notNull, { where: `${where} (${ref.key})`, idMaps, people, oldWorkspaceId, workspaceId, importer });
      }
      const fixup = ROW_FIXUPS[table.name];
      return fixup ? fixup(out, idMaps, where) : out;
    }),
  }));

  const attachmentIds = idMaps.attachments ?? new Map<string, string>();
  const files = doc.files.filter((f) => attachmentIds.has(f.attachmentId));
  if (files.length !== doc.files.length) throw invalid("The file lists stored files for attachments it does not contain. Nothing was imported.");
  if (new Set(files.map((f) => f.attachmentId)).size !== attachmentIds.size) {
    throw invalid("Every attached file needs exactly one entry in the export's files. Nothing was imported.");
  }

  const { id: _oldId, createdAt: _created, ...settings } = doc.workspace;
  const name = `${String(doc.workspace.name).slice(0, 160)} (imported ${dateFormat.format(on)})`;
  return {
    workspace: { ...settings, name },
    tables,
    idMaps,
    files,
    skippedPeople: doc.people.filter((p) => people.get(p.id) === null && p.role !== null),
  };
}

function mapReference(
  value: string,
  target: string,
  notNull: boolean,
  ctx: { where: string; idMaps: IdMaps; people: Map<string, string | null>; oldWorkspaceId: string; workspaceId: string; importer: Importer },
): string | null {
  if (target === "workspaces") {
    if (value !== ctx.oldWorkspaceId) throw invalid(`${ctx.where} points at another workspace. Nothing was imported.`);
    return ctx.workspaceId;
  }
  if (target === "users") {
    if (!ctx.people.has(value)) throw invalid(`${ctx.where} names a person who is not in the file's people list. Nothing was imported.`);
    return ctx.people.get(value) ?? (notNull ? ctx.importer.id : null);
  }
  const mapped = ctx.idMaps[target]?.get(value);
  if (!mapped) throw invalid(`${ctx.where} points at a row of ${target} that is not in the file. Nothing was imported.`);
  return mapped;
}
