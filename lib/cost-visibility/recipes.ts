import "server-only";
import { canSeeCosts } from "@/lib/auth/costs";
import type { Viewer } from "@/lib/auth/current";
import { can } from "@/lib/auth/permissions";
import type { RecipeRecord } from "@/lib/data/recipes";
import { listRecipes, type RecipeListPage } from "@/lib/data/recipes-list";
import { getVersion, listVersions, type VersionDetail, type VersionSummary } from "@/lib/data/recipes-versions";
import type { RecipeListQuery } from "@/lib/validation/recipes";

/** A recipe row without its cost per bar (the list and header of those who may not see costs). */
export function withoutRecipeCost<T extends { costPerBar: string | null }>(row: T): T {
  return { ...row, costPerBar: null };
}

/** A saved version without its prices: line prices, cost per kg and per bar, the engine's cost figure. */
export function withoutVersionCosts<T extends VersionSummary & Partial<Pick<VersionDetail, "lines" | "evaluation">>>(version: T): T {
  const out = { ...version, costPerKg: null, costPerBar: null };
  if (version.lines) out.lines = version.lines.map((l) => ({ ...l, pricePerKg: null }));
  if (version.evaluation) {
    const { costPerKg: _hidden, ...evaluation } = version.evaluation;
    out.evaluation = evaluation;
  }
  return out;
}

/**
 * One page of the recipe list for the page and its API: without the cost
 * column for those who may not see costs, and then never sorted by cost (the
 * order alone would tell which bar costs most); `query` is the one applied.
 */
export async function listRecipesForViewer({
  viewer,
  query,
}: {
  viewer: Viewer;
  query: RecipeListQuery;
}): Promise<{ page: RecipeListPage; query: RecipeListQuery; costsShown: boolean }> {
  const costsShown = await canSeeCosts(viewer);
  const applied: RecipeListQuery = !costsShown && query.sort === "cost" ? { ...query, sort: "updated", dir: undefined } : query;
  const page = await listRecipes({ workspaceId: viewer.workspace.id, query: applied, releasedOnly: !can(viewer.role, "recipes.read") });
  return { page: costsShown ? page : { ...page, rows: page.rows.map(withoutRecipeCost) }, query: applied, costsShown };
}

/** The recipe's versions for its history page, without costs for those who may not see them. */
export async function listVersionsForViewer({ viewer, recipe }: { viewer: Viewer; recipe: Pick<RecipeRecord, "id"> }) {
  const [versions, costsShown] = await Promise.all([listVersions({ workspaceId: viewer.workspace.id, recipeId: recipe.id }), canSeeCosts(viewer)]);
  return { versions: costsShown ? versions : versions.map((v) => withoutVersionCosts(v)), costsShown };
}

/** One saved version for the version and compare pages, without costs for those who may not see them. */
export async function getVersionForViewer({ viewer, recipeId, versionNo }: { viewer: Viewer; recipeId: string; versionNo: number }) {
  const [version, costsShown] = await Promise.all([getVersion({ workspaceId: viewer.workspace.id, recipeId, versionNo }), canSeeCosts(viewer)]);
  return { version: costsShown ? version : withoutVersionCosts(version), costsShown };
}
