import { apiRoute } from "@/lib/api/route";
import { routeId } from "@/lib/api/route-id";
import { deleteAttachment } from "@/lib/data/attachments";
import { emptySchema } from "@/lib/validation/auth";

/** DELETE /api/suppliers/:supplierId/files/:fileId — remove one of the supplier's files. */
export const DELETE = apiRoute({
  permission: "suppliers.edit",
  schema: emptySchema,
  handler: async ({ viewer, params }) => {
    await deleteAttachment({
      workspaceId: viewer.workspace.id,
      owner: { supplierId: routeId(params.supplierId, "That supplier") },
      attachmentId: routeId(params.fileId, "That file"),
    });
    return { ok: true };
  },
});
