import { apiRoute } from "@/lib/api/route";
import { listLotsForViewer } from "@/lib/cost-visibility/lots";
import { emptySchema } from "@/lib/validation/auth";

/**
 * GET /api/lots — the workspace's bean lots with yield chain and nib cost per kg (base currency);
 * the nib cost is null for a viewer who may not see costs (lib/auth/costs.ts).
 */
export const GET = apiRoute({
  permission: "lots.read",
  schema: emptySchema,
  handler: async ({ viewer }) => listLotsForViewer({ viewer }),
});
