import { z } from "zod";

/** GET /api/workspace/export: files inside the document (default) or only referenced by key and SHA-256. */
export const workspaceExportQuerySchema = z
  .object({ files: z.enum(["include", "reference"], "Choose files=include or files=reference.").default("include") })
  .strict();

/** POST /api/workspace/import: the export file as a multipart upload. */
export const workspaceImportSchema = z.object({ file: z.instanceof(File, { message: "Choose an export file (.json) to import." }) }).strict();
