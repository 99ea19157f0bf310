import { describe, expect, it } from "vitest";
import { schemaFingerprint } from "@/lib/workspace-transfer/fingerprint";
import { SCHEMA_FINGERPRINT, SCHEMA_VERSION, exportDocumentSchema } from "@/lib/workspace-transfer/format";
import { rowSchema } from "@/lib/workspace-transfer/row-schema";
import { ALL_TABLES, EXCLUDED_TABLES, EXPORTED_TABLES, scopeOf } from "@/lib/workspace-transfer/tables";

describe("the tables a workspace export carries", () => {
  it("exports every table of db/schema except those excluded with a reason", () => {
    const exported = new Set(EXPORTED_TABLES.map((t) => t.name));
    for (const name of ALL_TABLES.keys()) expect(exported.has(name) !== name in EXCLUDED_TABLES, name).toBe(true);
    for (const [name, reason] of Object.entries(EXCLUDED_TABLES)) {
      expect(ALL_TABLES.has(name), `${name} is excluded but no longer exists`).toBe(true);
      expect(reason.length).toBeGreaterThan(20);
    }
  });

  it("ties every exported table to one workspace, by workspace_id or a required key to an exported parent", () => {
    for (const table of EXPORTED_TABLES) expect(scopeOf(table), table.name).not.toBeNull();
  });

  it("can remap every reference: targets are exported tables, the workspace or a person", () => {
    const exported = new Set(EXPORTED_TABLES.map((t) => t.name));
    for (const table of EXPORTED_TABLES) {
      for (const ref of table.references) expect(exported.has(ref.target) || ["workspaces", "users"].includes(ref.target), `${table.name}.${ref.key}`).toBe(true);
    }
  });

  it("knows every uuid column: a primary key, a foreign key or a listed soft reference", () => {
    for (const table of EXPORTED_TABLES) {
      for (const { key, column } of table.columns) {
        if (column.columnType !== "PgUUID") continue;
        const known = table.primaryKey.includes(key) || table.references.some((r) => r.key === key);
        expect(known, `${table.name}.${key} is a uuid that is neither a key nor in SOFT_REFERENCES`).toBe(true);
      }
    }
  });

  it("orders tables so every referenced table comes first", () => {
    const seen = new Set<string>();
    for (const table of EXPORTED_TABLES) {
      for (const ref of table.references) {
        if (ref.target !== table.name && EXPORTED_TABLES.some((t) => t.name === ref.target)) expect(seen.has(ref.target), `${table.name} → ${ref.target}`).toBe(true);
      }
      seen.add(table.name);
    }
  });

  it("has a row schema for every column type in use", () => {
    for (const table of EXPORTED_TABLES) expect(() => rowSchema(table)).not.toThrow();
    expect(exportDocumentSchema).toBeDefined();
  });

  it("matches the schema fingerprint recorded for this schemaVersion (bump the version when a table changes)", () => {
    // If this fails, an exported table or column changed: raise SCHEMA_VERSION in
    // lib/workspace-transfer/format.ts, record the new fingerprint there, and
    // decide whether older files still import (SUPPORTED_SCHEMA_VERSIONS).
    expect({ schemaVersion: SCHEMA_VERSION, fingerprint: schemaFingerprint() }).toEqual({ schemaVersion: SCHEMA_VERSION, fingerprint: SCHEMA_FINGERPRINT });
  });
});
