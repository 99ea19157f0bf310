import "server-only";
import { db } from "@/db/client";
import { memberships, workspaces } from "@/db/schema";
import { slugFor } from "@/lib/data/workspaces";
import { AppError, invalid } from "@/lib/errors";
import type { Person, Row } from "./format";
import { removeFileCopies, storeFileCopies } from "./files";
import { planImport, type Importer } from "./plan";
import { readExportDocument } from "./read-document";
import type { IdMaps } from "./fixups";
import { randomUUID } from "node:crypto";

export type ImportResult = {
  workspaceId: string;
  name: string;
  /** Rows written per table. */
  counts: Record<string, number>;
  files: number;
  /** People of the exported workspace who were not added (invite them from the Team page). */
  skippedPeople: Pick<Person, "name" | "email" | "role">[];
  idMaps: IdMaps;
};

// PostgreSQL takes at most 65,535 parameters per statement.
const MAX_PARAMETERS = 60_000;

/**
 * Makes a new workspace from an export file, owned by the importer: the file
 * is read and checked whole first, the files are copied to storage, then every
 * row is written in one transaction. Any failure leaves nothing behind (the
 * transaction rolls back and the stored copies are removed).
 */
export async function importWorkspace({ bytes, importer }: { bytes: Uint8Array; importer: Importer }): Promise<ImportResult> {
  const doc = readExportDocument(bytes);
  const workspaceId = randomUUID();
  const plan = planImport(doc, { importer, workspaceId, on: new Date() });
  const copies = await storeFileCopies({ entries: plan.files, workspaceId, importerId: importer.id });
  const keyOf = new Map(copies.map((c) => [plan.idMaps.attachments!.get(c.attachmentId)!, c.key]));
  try {
    await db.transaction(async (tx) => {
      await tx.insert(workspaces).values({ ...(plan.workspace as typeof workspaces.$inferInsert), id: workspaceId, slug: slugFor(String(plan.workspace.name)) });
      await tx.insert(memberships).values({ workspaceId, userId: importer.id, role: "owner" });
      for (const { table, rows } of plan.tables) {
        const values = table.name === "attachments" ? rows.map((r) => ({ ...r, storageKey: keyOf.get(String(r.id)) })) : rows;
        const size = Math.max(1, Math.floor(MAX_PARAMETERS / table.columns.length));
        for (let i = 0; i < values.length; i += size) await tx.insert(table.table).values(values.slice(i, i + size) as Row[]);
      }
    });
  } catch (err) {
    await removeFileCopies(copies);
    throw asClearError(err);
  }
  return {
    workspaceId,
    name: String(plan.workspace.name),
    counts: Object.fromEntries(plan.tables.map(({ table, rows }) => [table.name, rows.length])),
    files: copies.length,
    skippedPeople: plan.skippedPeople.map(({ name, email, role }) => ({ name, email, role })),
    idMaps: plan.idMaps,
  };
}

/** A rule of the database the file's rows break (a duplicate name, a check) in words, not a raw error. */
function asClearError(err: unknown): unknown {
  if (err instanceof AppError) return err;
  const e = err as { code?: string; constraint?: string; table?: string; cause?: { code?: string; constraint?: string; table?: string } };
  const pg = e.code ? e : e.cause;
  if (pg?.code?.startsWith("23") || pg?.code?.startsWith("22")) {
    const what = pg.constraint ? ` (${pg.constraint})` : pg.table ? ` (${pg.table})` : "";
    return invalid(`The export's rows break a rule of the database${what}, so the file was edited or damaged. Nothing was imported.`);
  }
  return err;
}
