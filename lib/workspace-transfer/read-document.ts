import type { z } from "zod";
import { invalid } from "@/lib/errors";
import { exportDocumentSchema, MAX_IMPORT_BYTES, SCHEMA_VERSION, SUPPORTED_SCHEMA_VERSIONS, TRANSFER_FORMAT, type ExportDocument } from "./format";

const megabytes = (n: number) => `${(n / (1024 * 1024)).toFixed(0)} MB`;

/**
 * Reads an uploaded export file: size, JSON, our format and a schema version
 * this server reads, then every section and row against the schema. Each
 * refusal says what is wrong in words a person can act on.
 */
export function readExportDocument(bytes: Uint8Array): ExportDocument {
  if (bytes.byteLength === 0) throw invalid("That file is empty. Choose a workspace export (.json).");
  if (bytes.byteLength > MAX_IMPORT_BYTES) {
    throw invalid(
      `That file is larger than ${megabytes(MAX_IMPORT_BYTES)}. Download the export again without files (they are copied from this server's storage), then import that.`,
    );
  }
  let raw: unknown;
  try {
    raw = JSON.parse(new TextDecoder("utf-8", { fatal: true }).decode(bytes));
  } catch {
    throw invalid("That file is not a workspace export: it is not JSON text. Choose the .json file Barwright downloaded.");
  }
  const head = (raw ?? {}) as { format?: unknown; schemaVersion?: unknown };
  if (typeof raw !== "object" || Array.isArray(raw) || head.format !== TRANSFER_FORMAT) {
    throw invalid("That file is not a Barwright workspace export. Choose the .json file downloaded from “Backup and move”.");
  }
  if (typeof head.schemaVersion !== "number" || !Number.isInteger(head.schemaVersion)) {
    throw invalid("The export does not say which version of the format it uses, so it cannot be read.");
  }
  if (head.schemaVersion > SCHEMA_VERSION) {
    throw invalid(
      `This export was made by a newer Barwright (format version ${head.schemaVersion}; this server reads version ${SCHEMA_VERSION}). Import it on an up-to-date server.`,
    );
  }
  if (!SUPPORTED_SCHEMA_VERSIONS.includes(head.schemaVersion)) {
    throw invalid(`This export uses format version ${head.schemaVersion}, which this Barwright no longer reads. Export the workspace again from its server.`);
  }
  let parsed: ReturnType<typeof exportDocumentSchema.safeParse>;
  try {
    parsed = exportDocumentSchema.safeParse(raw);
  } catch (err) {
    // JSON nested thousands of levels deep (never written by an export) exhausts the stack.
    if (err instanceof RangeError) throw invalid("The export is damaged or was edited: it nests values far deeper than an export does. Nothing was imported.");
    throw err;
  }
  if (!parsed.success) {
    const problems = parsed.error.issues.slice(0, 5).map(describeIssue);
    throw invalid(`The export is damaged or was edited, so nothing was imported. ${problems.join(" ")}`, { file: problems });
  }
  return parsed.data;
}

/** "tables › recipes › row 3 › name: Expected string" from a zod issue. */
function describeIssue(issue: z.core.$ZodIssue): string {
  const parts = issue.path.map((p, i) => (typeof p === "number" ? `row ${p + 1}` : i === 0 && p === "tables" ? "" : String(p))).filter(Boolean);
  return `${parts.join(" › ") || "the document"}: ${issue.message}.`;
}
