import { apiRoute } from "@/lib/api/route";
import { routeId } from "@/lib/api/route-id";
import { deleteAttachment } from "@/lib/data/attachments";
import { emptySchema } from "@/lib/validation/auth";

/** DELETE /api/ingredients/:ingredientId/files/:fileId — remove one of the ingredient's files. */
export const DELETE = apiRoute({
  permission: "ingredients.edit",
  schema: emptySchema,
  handler: async ({ viewer, params }) => {
    await deleteAttachment({
      workspaceId: viewer.workspace.id,
      owner: { ingredientId: routeId(params.ingredientId, "That ingredient") },
      attachmentId: routeId(params.fileId, "That file"),
    });
    return { ok: true };
  },
});
