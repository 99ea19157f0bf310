import { apiRoute } from "@/lib/api/route";
import { routeId } from "@/lib/api/route-id";
import { addAttachment, listAttachments } from "@/lib/data/attachments";
import { MAX_FILE_BYTES } from "@/lib/files/check-upload";
import { emptySchema } from "@/lib/validation/auth";
import { lotFileUploadSchema } from "@/lib/validation/uploads";

/** GET /api/lots/:lotId/files — the lot's certificates and lab reports. */
export const GET = apiRoute({
  permission: "lots.read",
  schema: emptySchema,
  handler: async ({ viewer, params }) => {
    const lotId = routeId(params.lotId, "That lot");
    return { files: await listAttachments({ workspaceId: viewer.workspace.id, owner: { lotId } }) };
  },
});

/** POST /api/lots/:lotId/files — attach a PDF, PNG or JPEG (checked by content) to a lot. */
export const POST = apiRoute({
  permission: "lots.edit",
  schema: lotFileUploadSchema,
  body: "form",
  maxBodyBytes: MAX_FILE_BYTES + 64 * 1024,
  handler: async ({ input, viewer, params }) => {
    const lotId = routeId(params.lotId, "That lot");
    const file = await addAttachment({
      workspaceId: viewer.workspace.id,
      userId: viewer.user.id,
      owner: { lotId },
      kind: input.kind,
      fileName: input.file.name,
      bytes: new Uint8Array(await input.file.arrayBuffer()),
    });
    return { file };
  },
});
