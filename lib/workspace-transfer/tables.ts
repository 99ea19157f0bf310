import { is } from "drizzle-orm";
import { getTableConfig, PgTable, type PgColumn } from "drizzle-orm/pg-core";
import * as schema from "@/db/schema";

/**
 * Which tables a workspace export carries, derived from the Drizzle schema so a
 * new table cannot be left out by forgetting it: every table of db/schema is
 * exported unless it is listed in EXCLUDED_TABLES with a reason. An exported
 * table must belong to one workspace, through its own `workspace_id` or a
 * required foreign key to an exported table (tests/unit/workspace-transfer
 * fails otherwise).
 */
export const EXCLUDED_TABLES: Readonly<Record<string, string>> = {
  workspaces: "the workspace itself is the document's `workspace` section; the import makes a new one",
  users: "accounts are not moved: the `people` section lists names, e-mails and roles, never password hashes",
  memberships: "written out as the `people` section; the importer becomes the new workspace's only member",
  sessions: "sign-in state (session ids are secrets of this server)",
  invitations: "their tokens are single-use secrets of this workspace; the importer re-invites people",
  password_resets: "account recovery tokens, secrets of one user, not of a workspace",
};

/**
 * uuid columns that point at another row without a database foreign key (so
 * the schema cannot tell us); they are remapped like foreign keys.
 */
export const SOFT_REFERENCES: Readonly<Record<string, Readonly<Record<string, string>>>> = {
  // A copy keeps pointing at its source even after the source is gone.
  recipes: { copiedFromRecipeId: "recipes" },
};

export type ColumnInfo = { key: string; column: PgColumn };
export type Reference = { key: string; target: string; notNull: boolean };
export type TableInfo = {
  name: string;
  table: PgTable;
  columns: ColumnInfo[];
  /** The property keys of the primary key, in order. */
  primaryKey: string[];
  /** Foreign keys (and soft references) by property key → target table name. */
  references: Reference[];
  /** The property key of `workspace_id`, when the table has one. */
  workspaceKey: string | null;
};

function describeTable(table: PgTable): TableInfo {
  const config = getTableConfig(table);
  const entries = Object.entries(table as unknown as Record<string, PgColumn>).filter(([, c]) =>
    config.columns.includes(c),
  );
  const keyOf = (column: PgColumn) => entries.find(([, c]) => c.name === column.name)?.[0] ?? column.name;
  const columns = entries.map(([key, column]) => ({ key, column }));
  const primaryKey = [
    ...columns.filter((c) => c.column.primary).map((c) => c.key),
    ...config.primaryKeys.flatMap((pk) => pk.columns.map(keyOf)),
  ];
  const references: Reference[] = config.foreignKeys.map((fk) => {
    const ref = fk.reference();
    if (ref.columns.length !== 1) throw new Error(`${config.name}: composite foreign keys are not supported by the export`);
    return { key: keyOf(ref.columns[0]!), target: getTableConfig(ref.foreignTable).name, notNull: ref.columns[0]!.notNull };
  });
  for (const [key, target] of Object.entries(SOFT_REFERENCES[config.name] ?? {})) {
    const column = columns.find((c) => c.key === key);
    if (!column) throw new Error(`${config.name}.${key}: soft reference names no column`);
    references.push({ key, target, notNull: column.column.notNull });
  }
  const workspaceKey = columns.find((c) => c.column.name === "workspace_id")?.key ?? null;
  return { name: config.name, table, columns, primaryKey, references, workspaceKey };
}

/** Every table of db/schema, by SQL name. */
export const ALL_TABLES: ReadonlyMap<string, TableInfo> = new Map(
  (Object.values(schema) as unknown[])
    .filter((value) => is(value, PgTable))
    .map((table) => {
      const info = describeTable(table as PgTable);
      return [info.name, info] as const;
    }),
);

/**
 * The exported tables in an order where every referenced table comes first
 * (inserting in this order satisfies the foreign keys).
 */
export const EXPORTED_TABLES: readonly TableInfo[] = (() => {
  const pending = [...ALL_TABLES.values()].filter((t) => !(t.name in EXCLUDED_TABLES));
  const names = new Set(pending.map((t) => t.name));
  const ordered: TableInfo[] = [];
  const placed = new Set<string>();
  while (pending.length > 0) {
    const next = pending.findIndex((t) =>
      t.references.every((r) => r.target === t.name || !names.has(r.target) || placed.has(r.target)),
    );
    if (next < 0) throw new Error(`export: foreign keys form a cycle among ${pending.map((t) => t.name).join(", ")}`);
    const [table] = pending.splice(next, 1);
    ordered.push(table!);
    placed.add(table!.name);
  }
  return ordered;
})();

export const EXPORTED_TABLE_NAMES: ReadonlySet<string> = new Set(EXPORTED_TABLES.map((t) => t.name));

/**
 * How rows of a table are found from the workspace: its own `workspace_id`, or
 * the required foreign key through which its parent row belongs to it.
 */
export function scopeOf(table: TableInfo): { kind: "workspace"; key: string } | { kind: "parent"; key: string; parent: string } | null {
  if (table.workspaceKey) return { kind: "workspace", key: table.workspaceKey };
  const via = table.references.find((r) => r.notNull && r.target !== table.name && EXPORTED_TABLE_NAMES.has(r.target));
  return via ? { kind: "parent", key: via.key, parent: via.target } : null;
}
