import { apiRoute } from "@/lib/api/route";
import { can } from "@/lib/auth/permissions";
import { listRecipes } from "@/lib/data/recipes-list";
import { recipeListQuerySchema } from "@/lib/validation/recipes";

/**
 * GET /api/recipes?q=&type=&status=&sort=&dir=&page=&pageSize= — one page of
 * recipes. Production (released versions only) gets released recipes with the
 * released version's figures.
 */
export const GET = apiRoute({
  permission: "recipes.readReleased",
  schema: recipeListQuerySchema,
  handler: async ({ input, viewer }) =>
    listRecipes({ workspaceId: viewer.workspace.id, query: input, releasedOnly: !can(viewer.role, "recipes.read") }),
});
