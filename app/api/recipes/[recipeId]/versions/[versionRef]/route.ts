import { apiRoute } from "@/lib/api/route";
import { readVersionForViewer } from "@/lib/data/recipes-read";
import { emptySchema } from "@/lib/validation/auth";
import { recipeIdSchema, versionRefSchema } from "@/lib/validation/recipes";
import { notFound } from "@/lib/errors";

/**
 * GET /api/recipes/:recipeId/versions/:versionRef — one version as saved (lines
 * with their ingredient profiles and prices, the engine's output at save).
 * versionRef: a number, "latest" or "released". Unreleased versions need
 * recipes.read (production gets 403).
 */
export const GET = apiRoute({
  permission: "recipes.readReleased",
  schema: emptySchema,
  handler: async ({ viewer, params }) => {
    const recipeId = recipeIdSchema.safeParse(params.recipeId);
    const ref = versionRefSchema.safeParse(params.versionRef);
    if (!recipeId.success || !ref.success) throw notFound("That version");
    return readVersionForViewer({ viewer, recipeId: recipeId.data, ref: ref.data });
  },
});
