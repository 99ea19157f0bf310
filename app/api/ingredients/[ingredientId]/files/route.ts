import { apiRoute } from "@/lib/api/route";
import { addAttachment, listAttachments } from "@/lib/data/attachments";
import { MAX_FILE_BYTES } from "@/lib/files/check-upload";
import { routeId } from "@/lib/api/route-id";
import { emptySchema } from "@/lib/validation/auth";
import { attachmentUploadSchema } from "@/lib/validation/uploads";

/** GET /api/ingredients/:ingredientId/files — the ingredient's spec sheets and certificates. */
export const GET = apiRoute({
  permission: "ingredients.read",
  schema: emptySchema,
  handler: async ({ viewer, params }) => {
    const ingredientId = routeId(params.ingredientId, "That ingredient");
    return { files: await listAttachments({ workspaceId: viewer.workspace.id, owner: { ingredientId } }) };
  },
});

/** POST /api/ingredients/:ingredientId/files — attach a PDF, PNG or JPEG (checked by content). */
export const POST = apiRoute({
  permission: "ingredients.edit",
  schema: attachmentUploadSchema,
  body: "form",
  maxBodyBytes: MAX_FILE_BYTES + 64 * 1024,
  handler: async ({ input, viewer, params }) => {
    const ingredientId = routeId(params.ingredientId, "That ingredient");
    const file = await addAttachment({
      workspaceId: viewer.workspace.id,
      userId: viewer.user.id,
      owner: { ingredientId },
      kind: input.kind,
      fileName: input.file.name,
      bytes: new Uint8Array(await input.file.arrayBuffer()),
    });
    return { file };
  },
});
