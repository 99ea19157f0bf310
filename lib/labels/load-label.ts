import "server-only";
import type { Viewer } from "@/lib/auth/current";
import { can } from "@/lib/auth/permissions";
import { getLabelSettings, listLabelIngredients, type LabelSettings } from "@/lib/data/labels";
import { getRecipe, type RecipeRecord } from "@/lib/data/recipes";
import { readVersionForViewer } from "@/lib/data/recipes-read";
import type { VersionDetail } from "@/lib/data/recipes-versions";
import { notFound } from "@/lib/errors";
import { buildLabelView, type LabelView } from "./build-label-view";

export type LoadedLabel = { recipe: RecipeRecord; version: VersionDetail; settings: LabelSettings; view: LabelView };

/**
 * The label of a saved version (never a draft): the one asked for, else the released one,
 * else — for those who may read unreleased versions — the latest. Production sees released
 * versions only (readVersionForViewer refuses the others). Another workspace's recipe is
 * not_found.
 */
export async function loadLabel({ viewer, recipeId, versionNo }: { viewer: Viewer; recipeId: string; versionNo?: number }): Promise<LoadedLabel> {
  const workspaceId = viewer.workspace.id;
  const recipe = await getRecipe({ workspaceId, recipeId });
  const chosen = versionNo ?? recipe.releasedVersionNo ?? (can(viewer.role, "recipes.read") && recipe.latestVersionNo > 0 ? recipe.latestVersionNo : null);
  if (chosen === null) throw notFound(recipe.latestVersionNo > 0 ? "A released version of this recipe" : "A saved version of this recipe");
  const { version } = await readVersionForViewer({ viewer, recipeId, ref: chosen });
  const [settings, library] = await Promise.all([
    getLabelSettings({ workspaceId, recipeId }),
    listLabelIngredients({ workspaceId, ingredientIds: [...new Set(version.lines.map((l) => l.ingredientId))] }),
  ]);
  const view = buildLabelView({ barMassGrams: version.barMassGrams, lines: version.lines, library, settings });
  return { recipe, version, settings, view };
}
