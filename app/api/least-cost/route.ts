import { apiRoute } from "@/lib/api/route";
import { requireCostReader } from "@/lib/auth/costs";
import { solveLeastCostRequest } from "@/lib/least-cost/solve-request";
import { leastCostRequestSchema } from "@/lib/validation/least-cost";

/**
 * POST /api/least-cost — the cheapest mix of library ingredients (today's prices) that meets
 * the given bounds, composition limits and standards categories, brought onto the bench grid
 * and re-checked by the engine; or the constraints that cannot hold together. Computes only:
 * nothing is saved (the bench applies a proposal as an unsaved draft). The cheapest mix and its
 * cost are prices: 403 for a viewer who may not see costs (lib/auth/costs.ts).
 */
export const POST = apiRoute({
  permission: "recipes.read",
  schema: leastCostRequestSchema,
  handler: async ({ input, viewer }) => {
    await requireCostReader(viewer);
    return { result: await solveLeastCostRequest({ workspaceId: viewer.workspace.id, request: input }) };
  },
});
