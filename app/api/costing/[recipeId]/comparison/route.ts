import { apiRoute } from "@/lib/api/route";
import { routeId } from "@/lib/api/route-id";
import { requireCostReader } from "@/lib/auth/costs";
import { can } from "@/lib/auth/permissions";
import { comparisonCsv } from "@/lib/costing";
import { csvResponse } from "@/lib/csv/export";
import { loadRecipeCosting } from "@/lib/data/costing";
import { isoDay } from "@/lib/pricing/convert";
import { costingQuerySchema } from "@/lib/validation/costing";

/**
 * GET /api/costing/:recipeId/comparison?version=N — the supplier comparison of
 * a version (the latest by default) as CSV. Who sees costs is decided by
 * lib/auth/costs.ts (costs.read, or everyone when the owner allows it), so the
 * route itself only needs a signed-in member.
 */
export const GET = apiRoute({
  permission: "workspace.read",
  schema: costingQuerySchema,
  handler: async ({ input, viewer, params }) => {
    await requireCostReader(viewer);
    const on = isoDay(new Date());
    const costing = await loadRecipeCosting({ workspaceId: viewer.workspace.id, recipeId: routeId(params.recipeId, "That recipe"), versionNo: input.version, on, releasedOnly: !can(viewer.role, "recipes.read") });
    const csv = comparisonCsv(costing.report, { recipeName: costing.recipe.name, versionNo: costing.version.versionNo, currency: costing.baseCurrency, on });
    return csvResponse(csv, `${costing.recipe.name}-v${costing.version.versionNo}-suppliers.csv`);
  },
});
