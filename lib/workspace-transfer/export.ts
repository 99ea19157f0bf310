import "server-only";
import { asc, and, eq, gt, inArray, isNotNull } from "drizzle-orm";
import { drizzle, type NodePgDatabase } from "drizzle-orm/node-postgres";
import { pool } from "@/db/client";
import * as schema from "@/db/schema";
import { attachments, memberships, users, workspaces } from "@/db/schema";
import { notFound } from "@/lib/errors";
import { readStoredFile } from "./files";
import { SCHEMA_VERSION, TRANSFER_FORMAT, workspaceTable, type FileEntry, type Person, type Row } from "./format";
import { columnOf, scopeWhere } from "./scope";
import { EXPORTED_TABLES, type TableInfo } from "./tables";

const PAGE = 1000;

/**
 * The workspace as an export document, piece by piece (a route handler streams
 * it): header, workspace, people, every exported table page by page, then the
 * files. `includeFiles` puts each file's bytes in as base64; otherwise files
 * are referenced by storage key and SHA-256 (an import on this same server
 * copies them). Password hashes, sessions and tokens are never read.
 */
export async function* exportWorkspaceChunks(opts: { workspaceId: string; includeFiles: boolean }): AsyncGenerator<string> {
  // One snapshot for the whole document, so rows written meanwhile cannot leave
  // a line without its version (the import would refuse the file).
  const client = await pool.connect();
  let finished = false;
  try {
    await client.query("begin isolation level repeatable read read only");
    yield* writeDocument(drizzle(client, { schema }), opts);
    await client.query("commit");
    finished = true;
  } finally {
    // Also reached when the download is abandoned half-way.
    if (!finished) await client.query("rollback").catch(() => undefined);
    client.release();
  }
}

type Snapshot = NodePgDatabase<typeof schema>;

async function* writeDocument(db: Snapshot, { workspaceId, includeFiles }: { workspaceId: string; includeFiles: boolean }): AsyncGenerator<string> {
  const [workspace] = await db.select().from(workspaces).where(eq(workspaces.id, workspaceId));
  if (!workspace) throw notFound("That workspace");
  const kept = Object.fromEntries(workspaceTable.columns.map((c) => [c.key, (workspace as Row)[c.key]]));
  const header = { format: TRANSFER_FORMAT, schemaVersion: SCHEMA_VERSION, exportedAt: new Date().toISOString() };
  yield `${JSON.stringify(header).slice(0, -1)},"workspace":${JSON.stringify(kept)},"people":${JSON.stringify(await listPeople(db, workspaceId))},"tables":{`;
  for (const [i, table] of EXPORTED_TABLES.entries()) {
    yield `${i === 0 ? "" : ","}${JSON.stringify(table.name)}:[`;
    let first = true;
    for await (const rows of pagesOf(db, table, workspaceId)) {
      for (const row of rows) {
        yield `${first ? "" : ","}${JSON.stringify(row)}`;
        first = false;
      }
    }
    yield "]";
  }
  yield `},"files":[`;
  const files = await db
    .select({ id: attachments.id, storageKey: attachments.storageKey })
    .from(attachments)
    .where(eq(attachments.workspaceId, workspaceId))
    .orderBy(asc(attachments.id));
  for (const [i, file] of files.entries()) {
    const bytes = await readStoredFile(file.storageKey);
    const entry: FileEntry = {
      attachmentId: file.id,
      storageKey: file.storageKey,
      sha256: bytes.sha256,
      sizeBytes: bytes.data.byteLength,
      ...(includeFiles ? { data: Buffer.from(bytes.data).toString("base64") } : {}),
    };
    yield `${i === 0 ? "" : ","}${JSON.stringify(entry)}`;
  }
  yield "]}";
}

/** The whole export as one string (tests, small workspaces). */
export async function exportWorkspace(opts: { workspaceId: string; includeFiles: boolean }): Promise<string> {
  let out = "";
  for await (const chunk of exportWorkspaceChunks(opts)) out += chunk;
  return out;
}

/** A table's rows of the workspace, a page at a time, in primary-key order. */
async function* pagesOf(db: Snapshot, table: TableInfo, workspaceId: string): AsyncGenerator<Row[]> {
  const keys = table.primaryKey.map((k) => columnOf(table, k));
  const where = scopeWhere(table, workspaceId);
  if (keys.length === 1) {
    let after: unknown = null;
    for (;;) {
      const rows = (await db
        .select()
        .from(table.table)
        .where(after === null ? where : and(where, gt(keys[0]!, after)))
        .orderBy(asc(keys[0]!))
        .limit(PAGE)) as Row[];
      if (rows.length === 0) return;
      yield rows;
      after = rows.at(-1)![table.primaryKey[0]!];
    }
  }
  for (let offset = 0; ; offset += PAGE) {
    const rows = (await db.select().from(table.table).where(where).orderBy(...keys.map((k) => asc(k))).limit(PAGE).offset(offset)) as Row[];
    if (rows.length === 0) return;
    yield rows;
  }
}

/**
 * The workspace's members with their roles, and anyone else its rows name as
 * an author (role null: they have left). Names and e-mails only.
 */
async function listPeople(db: Snapshot, workspaceId: string): Promise<Person[]> {
  const members = await db
    .select({ id: users.id, name: users.name, email: users.email, role: memberships.role })
    .from(memberships)
    .innerJoin(users, eq(users.id, memberships.userId))
    .where(eq(memberships.workspaceId, workspaceId));
  const known = new Set(members.map((m) => m.id));
  const authors = new Set<string>();
  for (const table of EXPORTED_TABLES) {
    for (const ref of table.references.filter((r) => r.target === "users")) {
      const column = columnOf(table, ref.key);
      const rows = await db.selectDistinct({ id: column }).from(table.table).where(and(scopeWhere(table, workspaceId), isNotNull(column)));
      for (const r of rows) if (!known.has(r.id as string)) authors.add(r.id as string);
    }
  }
  const former =
    authors.size === 0
      ? []
      : await db.select({ id: users.id, name: users.name, email: users.email }).from(users).where(inArray(users.id, [...authors]));
  return [...members, ...former.map((f) => ({ ...f, role: null }))].sort((a, b) => a.email.localeCompare(b.email));
}
