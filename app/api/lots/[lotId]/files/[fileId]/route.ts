import { apiRoute } from "@/lib/api/route";
import { routeId } from "@/lib/api/route-id";
import { deleteAttachment } from "@/lib/data/attachments";
import { emptySchema } from "@/lib/validation/auth";

/** DELETE /api/lots/:lotId/files/:fileId — remove one of the lot's files. */
export const DELETE = apiRoute({
  permission: "lots.edit",
  schema: emptySchema,
  handler: async ({ viewer, params }) => {
    await deleteAttachment({
      workspaceId: viewer.workspace.id,
      owner: { lotId: routeId(params.lotId, "That lot") },
      attachmentId: routeId(params.fileId, "That file"),
    });
    return { ok: true };
  },
});
