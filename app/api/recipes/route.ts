import { apiRoute } from "@/lib/api/route";
import { listRecipesForViewer } from "@/lib/cost-visibility/recipes";
import { recipeListQuerySchema } from "@/lib/validation/recipes";

/**
 * GET /api/recipes?q=&type=&status=&sort=&dir=&page=&pageSize= — one page of
 * recipes. Production (released versions only) gets released recipes with the
 * released version's figures. Those who may not see costs (lib/auth/costs.ts)
 * get no cost per bar, and a cost sort falls back to the default order.
 */
export const GET = apiRoute({
  permission: "recipes.readReleased",
  schema: recipeListQuerySchema,
  handler: async ({ input, viewer }) => {
    const { page, costsShown } = await listRecipesForViewer({ viewer, query: input });
    return { ...page, costsShown };
  },
});
