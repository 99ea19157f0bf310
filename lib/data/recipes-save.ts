import "server-only";
import { conflict } from "@/lib/errors";
import { inTransaction, type Executor } from "./recipes-db";
import { getRecipe, lockRecipe } from "./recipes";
import { loadBenchIngredients } from "./recipes-ingredients";
import { isUniqueViolation } from "./pg-errors";
import { insertVersionRows } from "./recipes-rows";

export type SaveVersionArgs = {
  workspaceId: string;
  authorId: string | null;
  recipeId: string;
  /** The version the editor started from; 0 for a recipe with none. */
  baseVersionNo: number;
  note?: string;
  barMassGrams: string;
  lines: ReadonlyArray<{ ingredientId: string; percent: string }>;
  restoredFromVersionNo?: number;
  /** The day whose prices are used (today unless the caller says otherwise). */
  on?: Date;
  executor?: Executor;
};

/** Thrown when the recipe moved on since the draft's base: nothing is written. */
export function staleBaseConflict(latest: number, base: number) {
  return conflict(
    `v${latest} was saved since you started from ${base === 0 ? "an empty recipe" : `v${base}`}. Nothing was overwritten: compare the two and choose.`,
  );
}

/**
 * Saves a new version (the service behind save, restore, copy and the demo):
 * reads the ingredients and today's prices, recomputes everything with the
 * engine (client totals are never trusted), then, holding the recipe's row
 * lock, inserts version base + 1 only if base is still the latest version.
 * Otherwise a conflict, and nothing is written. Lines must already be valid
 * (lib/validation/recipes.ts).
 */
export async function saveRecipeVersion(args: SaveVersionArgs): Promise<{ versionNo: number }> {
  const { workspaceId, recipeId, baseVersionNo } = args;
  // Another workspace's recipe is "not found" before its ingredients are "unknown".
  await getRecipe({ workspaceId, recipeId, executor: args.executor });
  const byId = await loadBenchIngredients({ workspaceId, ingredientIds: args.lines.map((l) => l.ingredientId), on: args.on ?? new Date(), executor: args.executor });
  const resolved = args.lines.map((l) => ({ ingredient: byId.get(l.ingredientId)!, percent: l.percent }));
  try {
    return await inTransaction(args.executor, async (tx) => {
      const recipe = await lockRecipe(tx, { workspaceId, recipeId });
      if (recipe.latestVersionNo !== baseVersionNo) throw staleBaseConflict(recipe.latestVersionNo, baseVersionNo);
      const versionNo = baseVersionNo + 1;
      await insertVersionRows(tx, {
        workspaceId,
        recipeId,
        versionNo,
        basedOnVersionNo: baseVersionNo === 0 ? null : baseVersionNo,
        restoredFromVersionNo: args.restoredFromVersionNo,
        note: args.note,
        authorId: args.authorId,
        barMassGrams: args.barMassGrams,
        lines: resolved,
      });
      return { versionNo };
    });
  } catch (err) {
    // The row lock makes this unreachable in practice; the unique key is the last word.
    if (isUniqueViolation(err, "recipe_versions_recipe_version")) throw staleBaseConflict(baseVersionNo + 1, baseVersionNo);
    throw err;
  }
}
