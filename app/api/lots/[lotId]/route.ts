import { apiRoute } from "@/lib/api/route";
import { getLotForViewer } from "@/lib/cost-visibility/lots";
import { notFound } from "@/lib/errors";
import { emptySchema, idSchema } from "@/lib/validation/auth";

/**
 * GET /api/lots/:lotId — one lot, its records, chain and nib cost; 404 for another workspace's lot.
 * Price paid, cost lines, processing costs and nib cost are left out for a viewer who may not see costs.
 */
export const GET = apiRoute({
  permission: "lots.read",
  schema: emptySchema,
  handler: async ({ viewer, params }) => {
    const id = idSchema.safeParse(params.lotId);
    if (!id.success) throw notFound("That lot");
    return getLotForViewer({ viewer, lotId: id.data });
  },
});
