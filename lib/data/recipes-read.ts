import "server-only";
import type { Viewer } from "@/lib/auth/current";
import { can } from "@/lib/auth/permissions";
import { forbidden, notFound } from "@/lib/errors";
import { getRecipe, type RecipeRecord } from "./recipes";
import { getVersion, type VersionDetail } from "./recipes-versions";

export type VersionRef = number | "latest" | "released";

/**
 * A version as the viewer may see it: anyone with recipes.read sees every
 * version; others (production) only versions that were released, else forbidden.
 */
export async function readVersionForViewer({
  viewer,
  recipeId,
  ref,
}: {
  viewer: Viewer;
  recipeId: string;
  ref: VersionRef;
}): Promise<{ recipe: RecipeRecord; version: VersionDetail }> {
  const workspaceId = viewer.workspace.id;
  const recipe = await getRecipe({ workspaceId, recipeId });
  const versionNo = ref === "latest" ? recipe.latestVersionNo : ref === "released" ? recipe.releasedVersionNo : ref;
  if (!versionNo) throw notFound(ref === "released" ? "A released version of this recipe" : "A saved version of this recipe");
  const version = await getVersion({ workspaceId, recipeId, versionNo });
  if (!version.released && !can(viewer.role, "recipes.read")) throw forbidden("read versions that are not released");
  return { recipe, version };
}
