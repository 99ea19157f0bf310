import { createHash } from "node:crypto";
import { workspaceTable } from "./format";
import { EXPORTED_TABLES } from "./tables";

/**
 * A short hash of what the export carries: every exported table with its
 * columns' names, types and nullability. It changes exactly when an export
 * file's shape changes, which is when SCHEMA_VERSION must be bumped.
 */
export function schemaFingerprint(): string {
  const shape = [workspaceTable, ...EXPORTED_TABLES]
    .map((t) => [t.name, t.columns.map((c) => `${c.key}:${c.column.columnType}:${c.column.notNull ? "1" : "0"}`).sort()] as const)
    .sort(([a], [b]) => a.localeCompare(b));
  return createHash("sha256").update(JSON.stringify(shape)).digest("hex").slice(0, 16);
}
