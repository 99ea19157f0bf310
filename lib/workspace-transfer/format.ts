import { z } from "zod";
import { roles } from "@/db/schema/users";
import { rowSchema } from "./row-schema";
import { ALL_TABLES, EXPORTED_TABLES, type TableInfo } from "./tables";

/**
 * The workspace export file ("barwright-workspace"): one JSON document.
 * `schemaVersion` changes whenever an exported table or column changes
 * (tests/unit/workspace-transfer/format.test.ts holds the schema's fingerprint
 * and fails until it is bumped); this server imports only the versions listed
 * in SUPPORTED_SCHEMA_VERSIONS. DEVELOPERS.md describes the layout.
 */
export const TRANSFER_FORMAT = "barwright-workspace";
export const SCHEMA_VERSION = 1;
export const SUPPORTED_SCHEMA_VERSIONS: readonly number[] = [1];

/** The fingerprint of the exported tables and columns that SCHEMA_VERSION describes. */
export const SCHEMA_FINGERPRINT = "d21cdeadf85614c0";

/** The largest export file an import accepts (files included as base64 count). */
export const MAX_IMPORT_BYTES = 50 * 1024 * 1024;

/** Columns of the workspace row the file leaves out, because the import always makes them anew. */
const WORKSPACE_OMITTED = new Set(["slug"]);

export const workspaceTable: TableInfo = (() => {
  const full = ALL_TABLES.get("workspaces");
  if (!full) throw new Error("workspace export: no workspaces table");
  return { ...full, columns: full.columns.filter((c) => !WORKSPACE_OMITTED.has(c.key)) };
})();

export const personSchema = z
  .object({
    /** The person's id in the exporting server: what the rows' author columns point at. */
    id: z.guid(),
    name: z.string().min(1).max(200),
    // Only compared with the importer's address, never used to create an account or send mail.
    email: z.string().min(3).max(254).regex(/@/, "Expected an e-mail address."),
    /** Their role in the workspace; null for someone who has left but still authored rows. */
    role: z.enum(roles).nullable(),
  })
  .strict();

export const fileEntrySchema = z
  .object({
    attachmentId: z.guid(),
    /** Where the bytes were stored on the exporting server. */
    storageKey: z.string().min(1).max(1000),
    sha256: z.string().regex(/^[0-9a-f]{64}$/, "Expected a SHA-256 in lower-case hex."),
    sizeBytes: z.number().int().min(0),
    /** The bytes in base64; absent when the export only references stored files. */
    data: z.base64("Expected the file's bytes in base64.").optional(),
  })
  .strict();

const tablesSchema = z
  .object(Object.fromEntries(EXPORTED_TABLES.map((t) => [t.name, z.array(rowSchema(t))])))
  .strict();

export const exportDocumentSchema = z
  .object({
    format: z.literal(TRANSFER_FORMAT),
    schemaVersion: z.literal(SCHEMA_VERSION),
    exportedAt: z.iso.datetime({ offset: true }),
    workspace: rowSchema(workspaceTable),
    people: z.array(personSchema),
    tables: tablesSchema,
    files: z.array(fileEntrySchema),
  })
  .strict();

export type ExportDocument = z.infer<typeof exportDocumentSchema>;
export type Person = z.infer<typeof personSchema>;
export type FileEntry = z.infer<typeof fileEntrySchema>;
export type Row = Record<string, unknown>;
