import "server-only";
import { canSeeCosts } from "@/lib/auth/costs";
import type { Viewer } from "@/lib/auth/current";
import type { RecipeRecord } from "@/lib/data/recipes";
import { getBaseCurrency } from "@/lib/data/exchange-rates";
import { listNibSources } from "@/lib/data/lots";
import { listBenchIngredients } from "@/lib/data/recipes-ingredients";
import { getVersion } from "@/lib/data/recipes-versions";

/**
 * What the bench page hands to the browser: the latest version, the library,
 * and — only for those who may see costs (lib/auth/costs.ts) — prices and the
 * bean lots whose nibs can price a line. The others get the library without a
 * single price, so nothing in the page's payload tells what an ingredient costs.
 */
export async function loadBenchData({ viewer, recipe, on = new Date() }: { viewer: Viewer; recipe: RecipeRecord; on?: Date }) {
  const workspaceId = viewer.workspace.id;
  const showCosts = await canSeeCosts(viewer);
  const [latest, priced, currency, lotSources] = await Promise.all([
    recipe.latestVersionNo ? getVersion({ workspaceId, recipeId: recipe.id, versionNo: recipe.latestVersionNo }) : null,
    listBenchIngredients({ workspaceId, on }),
    getBaseCurrency({ workspaceId }),
    showCosts ? listNibSources({ workspaceId }) : [],
  ]);
  const base = {
    versionNo: recipe.latestVersionNo,
    barMassGrams: latest?.barMassGrams ?? recipe.barMassGrams,
    lines: latest?.lines.map((l) => ({ ingredientId: l.ingredientId, percent: l.percent })) ?? [],
  };
  const library = showCosts ? priced : priced.map((i) => ({ ...i, pricePerKg: null }));
  return { base, library, currency, showCosts, lotSources };
}
