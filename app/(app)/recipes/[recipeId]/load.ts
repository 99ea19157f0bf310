import "server-only";
import { notFound } from "next/navigation";
import { cache } from "react";
import { requireViewer } from "@/lib/auth/current";
import { can } from "@/lib/auth/permissions";
import { getRecipe } from "@/lib/data/recipes";
import { AppError } from "@/lib/errors";
import { recipeIdSchema } from "@/lib/validation/recipes";

/** An AppError "not found" as Next's 404 page; anything else goes on to the error boundary. */
export function orNotFound(err: unknown): never {
  if (err instanceof AppError && err.code === "not_found") notFound();
  throw err;
}

/**
 * The viewer and the recipe of a /recipes/[recipeId] page, once per request.
 * A malformed id or another workspace's recipe is a 404.
 */
export const loadRecipePage = cache(async (recipeIdParam: string) => {
  const viewer = await requireViewer();
  if (!can(viewer.role, "recipes.readReleased")) notFound();
  const id = recipeIdSchema.safeParse(recipeIdParam);
  if (!id.success) notFound();
  const recipe = await getRecipe({ workspaceId: viewer.workspace.id, recipeId: id.data }).catch(orNotFound);
  return { viewer, recipe, readsAll: can(viewer.role, "recipes.read"), edits: can(viewer.role, "recipes.edit") };
});
