import { apiRoute } from "@/lib/api/route";
import { workspaceImportSchema } from "@/lib/validation/workspace-transfer";
import { MAX_IMPORT_BYTES } from "@/lib/workspace-transfer/format";
import { importWorkspace } from "@/lib/workspace-transfer/import";

/**
 * POST /api/workspace/import — makes a new workspace from an export file,
 * owned by the caller (an owner of their current workspace). The current
 * workspace is not touched; the answer names the new one to switch to.
 */
export const POST = apiRoute({
  permission: "workspace.import",
  schema: workspaceImportSchema,
  body: "form",
  maxBodyBytes: MAX_IMPORT_BYTES + 64 * 1024,
  handler: async ({ input, viewer }) => {
    const { idMaps: _maps, ...result } = await importWorkspace({
      bytes: new Uint8Array(await input.file.arrayBuffer()),
      importer: { id: viewer.user.id, email: viewer.user.email },
    });
    return result;
  },
});
