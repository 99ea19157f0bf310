import { apiRoute } from "@/lib/api/route";
import { workspaceExportQuerySchema } from "@/lib/validation/workspace-transfer";
import { exportFileName, exportResponse } from "@/lib/workspace-transfer/response";

/**
 * GET /api/workspace/export?files=include|reference — the whole workspace as
 * one JSON document, streamed as a download (owners only).
 */
export const GET = apiRoute({
  permission: "workspace.export",
  schema: workspaceExportQuerySchema,
  handler: async ({ input, viewer }) =>
    exportResponse({
      workspaceId: viewer.workspace.id,
      includeFiles: input.files === "include",
      fileName: exportFileName(viewer.workspace.name, new Date()),
    }),
});
