import { apiRoute } from "@/lib/api/route";
import { routeId } from "@/lib/api/route-id";
import { getAttachment } from "@/lib/data/attachments";
import { getObject } from "@/lib/storage/s3";
import { emptySchema } from "@/lib/validation/auth";

/**
 * GET /api/files/:fileId — a stored file, only for members of its workspace
 * (anyone else gets 404). Served with the type found in its bytes at upload, as
 * an attachment, never sniffed, never cached by shared caches.
 */
export const GET = apiRoute({
  permission: "ingredients.read",
  schema: emptySchema,
  handler: async ({ viewer, params }) => {
    const file = await getAttachment({ workspaceId: viewer.workspace.id, attachmentId: routeId(params.fileId, "That file") });
    const object = await getObject({ key: file.storageKey });
    const asciiName = file.fileName.replace(/[^\x20-\x7e]/g, "_").replace(/["\\]/g, "_");
    return new Response(object.body, {
      headers: {
        "content-type": file.contentType,
        "content-length": String(object.length ?? file.sizeBytes),
        "content-disposition": `attachment; filename="${asciiName}"; filename*=UTF-8''${encodeURIComponent(file.fileName)}`,
        "cache-control": "private, no-store",
        "x-content-type-options": "nosniff",
        "content-security-policy": "default-src 'none'; sandbox",
      },
    });
  },
});
