import { revalidatePath } from "next/cache";
import { NextResponse } from "next/server";
import { apiRoute } from "@/lib/api/route";
import { saveRecipeVersion } from "@/lib/data/recipes-save";
import { notFound } from "@/lib/errors";
import { recipeIdSchema, saveVersionBodySchema } from "@/lib/validation/recipes";

/**
 * POST /api/recipes/:recipeId/versions — saves a new version, as the bench's
 * save does (the same service: prices read and the engine rerun on the server,
 * insert only if `baseVersionNo` is still the latest). 201 `{ recipeId, versionNo }`;
 * 409 when another version was saved since the base (nothing written); 422 for
 * lines that do not add up to 100 % or name unknown ingredients.
 */
export const POST = apiRoute({
  permission: "recipes.edit",
  schema: saveVersionBodySchema,
  handler: async ({ input, viewer, params }) => {
    const recipeId = recipeIdSchema.safeParse(params.recipeId);
    if (!recipeId.success) throw notFound("That recipe");
    const saved = await saveRecipeVersion({ ...input, recipeId: recipeId.data, workspaceId: viewer.workspace.id, authorId: viewer.user.id });
    revalidatePath("/recipes");
    revalidatePath(`/recipes/${recipeId.data}`, "layout");
    return NextResponse.json({ recipeId: recipeId.data, versionNo: saved.versionNo }, { status: 201, headers: { "cache-control": "no-store" } });
  },
});
