import { apiRoute } from "@/lib/api/route";
import { routeId } from "@/lib/api/route-id";
import { can } from "@/lib/auth/permissions";
import { getAttachment } from "@/lib/data/attachments";
import { forbidden } from "@/lib/errors";
import { getObject } from "@/lib/storage/s3";
import { emptySchema } from "@/lib/validation/auth";

/**
 * GET /api/files/:fileId — a stored file, only for members of its workspace
 * (anyone else gets 404); a bean lot's file also needs lots.read. Served with the type found in its bytes at upload, as
 * an attachment, never sniffed, never cached by shared caches.
 */
export const GET = apiRoute({
  permission: "ingredients.read",
  schema: emptySchema,
  handler: async ({ viewer, params }) => {
    const file = await getAttachment({ workspaceId: viewer.workspace.id, attachmentId: routeId(params.fileId, "That file") });
    if (file.lotId && !can(viewer.role, "lots.read")) throw forbidden("read bean lots' files");
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
