import { apiRoute } from "@/lib/api/route";
import { getLotDetail } from "@/lib/data/lots";
import { notFound } from "@/lib/errors";
import { emptySchema, idSchema } from "@/lib/validation/auth";

/** GET /api/lots/:lotId — one lot, its records, chain and nib cost; 404 for another workspace's lot. */
export const GET = apiRoute({
  permission: "lots.read",
  schema: emptySchema,
  handler: async ({ viewer, params }) => {
    const id = idSchema.safeParse(params.lotId);
    if (!id.success) throw notFound("That lot");
    return getLotDetail({ workspaceId: viewer.workspace.id, lotId: id.data });
  },
});
