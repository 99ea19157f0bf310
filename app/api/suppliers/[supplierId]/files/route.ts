import { apiRoute } from "@/lib/api/route";
import { addAttachment, listAttachments } from "@/lib/data/attachments";
import { MAX_FILE_BYTES } from "@/lib/files/check-upload";
import { routeId } from "@/lib/api/route-id";
import { emptySchema } from "@/lib/validation/auth";
import { attachmentUploadSchema } from "@/lib/validation/uploads";

/** GET /api/suppliers/:supplierId/files — the supplier's certificates and documents. */
export const GET = apiRoute({
  permission: "ingredients.read",
  schema: emptySchema,
  handler: async ({ viewer, params }) => {
    const supplierId = routeId(params.supplierId, "That supplier");
    return { files: await listAttachments({ workspaceId: viewer.workspace.id, owner: { supplierId } }) };
  },
});

/** POST /api/suppliers/:supplierId/files — attach a PDF, PNG or JPEG (checked by content). */
export const POST = apiRoute({
  permission: "suppliers.edit",
  schema: attachmentUploadSchema,
  body: "form",
  maxBodyBytes: MAX_FILE_BYTES + 64 * 1024,
  handler: async ({ input, viewer, params }) => {
    const supplierId = routeId(params.supplierId, "That supplier");
    const file = await addAttachment({
      workspaceId: viewer.workspace.id,
      userId: viewer.user.id,
      owner: { supplierId },
      kind: input.kind,
      fileName: input.file.name,
      bytes: new Uint8Array(await input.file.arrayBuffer()),
    });
    return { file };
  },
});
