import "server-only";
import { eq, inArray, type SQL } from "drizzle-orm";
import type { PgColumn } from "drizzle-orm/pg-core";
import { db } from "@/db/client";
import { ALL_TABLES, scopeOf, type TableInfo } from "./tables";

export function columnOf(table: TableInfo, key: string): PgColumn {
  const found = table.columns.find((c) => c.key === key);
  if (!found) throw new Error(`${table.name} has no column ${key}`);
  return found.column;
}

/**
 * The condition selecting one workspace's rows of a table: its own
 * `workspace_id`, or (for a line table) a parent row of that workspace.
 */
export function scopeWhere(table: TableInfo, workspaceId: string): SQL {
  const scope = scopeOf(table);
  if (!scope) throw new Error(`${table.name} cannot be tied to a workspace`);
  if (scope.kind === "workspace") return eq(columnOf(table, scope.key), workspaceId);
  const parent = ALL_TABLES.get(scope.parent)!;
  const parentIds = db
    .select({ id: columnOf(parent, parent.primaryKey[0]!) })
    .from(parent.table)
    .where(scopeWhere(parent, workspaceId));
  return inArray(columnOf(table, scope.key), parentIds);
}
