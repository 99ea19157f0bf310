import { apiRoute } from "@/lib/api/route";
import { canSeeCosts } from "@/lib/auth/costs";
import { withoutRecipeCost, withoutVersionCosts } from "@/lib/cost-visibility/recipes";
import { readVersionForViewer } from "@/lib/data/recipes-read";
import { emptySchema } from "@/lib/validation/auth";
import { recipeIdSchema, versionRefSchema } from "@/lib/validation/recipes";
import { notFound } from "@/lib/errors";

/**
 * GET /api/recipes/:recipeId/versions/:versionRef — one version as saved (lines
 * with their ingredient profiles and prices, the engine's output at save).
 * versionRef: a number, "latest" or "released". Unreleased versions need
 * recipes.read (production gets 403). Prices and costs only for those who may
 * see costs (lib/auth/costs.ts).
 */
export const GET = apiRoute({
  permission: "recipes.readReleased",
  schema: emptySchema,
  handler: async ({ viewer, params }) => {
    const recipeId = recipeIdSchema.safeParse(params.recipeId);
    const ref = versionRefSchema.safeParse(params.versionRef);
    if (!recipeId.success || !ref.success) throw notFound("That version");
    const { recipe, version } = await readVersionForViewer({ viewer, recipeId: recipeId.data, ref: ref.data });
    if (await canSeeCosts(viewer)) return { recipe, version };
    return { recipe: withoutRecipeCost(recipe), version: withoutVersionCosts(version) };
  },
});
