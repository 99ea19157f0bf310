import "server-only";
import { and, eq } from "drizzle-orm";
import { recipes, recipeVersionLines, recipeVersions } from "@/db/schema";
import { evaluateRecipe } from "@/lib/formulation";
import { conflict } from "@/lib/errors";
import { toRecipeLines } from "@/lib/recipes/engine-lines";
import { toStored, versionFigures } from "@/lib/recipes/figures";
import { PROFILE_FIELDS, type BenchIngredient } from "@/lib/recipes/types";
import { inTransaction, type Executor } from "./recipes-db";
import { getRecipe, lockRecipe } from "./recipes";
import { loadBenchIngredients } from "./recipes-ingredients";
import { isUniqueViolation } from "./pg-errors";

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

function snapshotLine(versionId: string, position: number, ingredient: BenchIngredient, percent: string) {
  const fields = Object.fromEntries(PROFILE_FIELDS.map((f) => [f, ingredient[f]])) as Record<(typeof PROFILE_FIELDS)[number], string>;
  return {
    versionId,
    position,
    ingredientId: ingredient.id,
    percent,
    ingredientName: ingredient.name,
    ...fields,
    isInclusion: ingredient.isInclusion,
    allergens: ingredient.allergens,
    pricePerKg: ingredient.pricePerKg,
  };
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
  const engineLines = toRecipeLines(resolved.map((r) => ({ profile: r.ingredient, percent: r.percent })));
  const evaluation = evaluateRecipe({ lines: engineLines });
  const figures = versionFigures(evaluation, engineLines, args.barMassGrams);
  try {
    return await inTransaction(args.executor, async (tx) => {
      const recipe = await lockRecipe(tx, { workspaceId, recipeId });
      if (recipe.latestVersionNo !== baseVersionNo) throw staleBaseConflict(recipe.latestVersionNo, baseVersionNo);
      const versionNo = baseVersionNo + 1;
      const [version] = await tx
        .insert(recipeVersions)
        .values({
          workspaceId,
          recipeId,
          versionNo,
          basedOnVersionNo: baseVersionNo === 0 ? null : baseVersionNo,
          restoredFromVersionNo: args.restoredFromVersionNo ?? null,
          note: args.note ?? null,
          authorId: args.authorId,
          barMassGrams: args.barMassGrams,
          cocoaPercent: toStored(figures.cocoaPercent)!,
          costPerKg: toStored(figures.costPerKg),
          costPerBar: toStored(figures.costPerBar),
          evaluation,
        })
        .returning({ id: recipeVersions.id });
      await tx.insert(recipeVersionLines).values(resolved.map((r, i) => snapshotLine(version!.id, i, r.ingredient, r.percent)));
      await tx
        .update(recipes)
        .set({
          latestVersionNo: versionNo,
          barMassGrams: args.barMassGrams,
          cocoaPercent: toStored(figures.cocoaPercent),
          costPerBar: toStored(figures.costPerBar),
          updatedAt: new Date(),
        })
        .where(and(eq(recipes.workspaceId, workspaceId), eq(recipes.id, recipeId)));
      return { versionNo };
    });
  } catch (err) {
    // The row lock makes this unreachable in practice; the unique key is the last word.
    if (isUniqueViolation(err, "recipe_versions_recipe_version")) throw staleBaseConflict(baseVersionNo + 1, baseVersionNo);
    throw err;
  }
}
