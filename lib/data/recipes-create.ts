import "server-only";
import { AppError, invalid } from "@/lib/errors";
import { findStartingPoint } from "@/lib/recipes/starting-points";
import type { CreateRecipeInput } from "@/lib/validation/recipes";
import { inTransaction, type Executor } from "./recipes-db";
import { getRecipe, insertRecipe } from "./recipes";
import { ensureReferenceIngredients } from "./recipes-ingredients";
import { saveRecipeVersion } from "./recipes-save";
import { getVersion } from "./recipes-versions";

type Who = { workspaceId: string; userId: string; executor?: Executor };

/**
 * A new recipe: empty (its first save is v1), from one of our starting points
 * (v1 holds its lines; missing reference ingredients are added to the library),
 * or copied from another recipe's latest version.
 */
export async function createRecipe({ workspaceId, userId, input, executor }: Who & { input: CreateRecipeInput }): Promise<{ recipeId: string }> {
  const base = {
    name: input.name,
    chocolateType: input.chocolateType,
    targetCocoaPercent: input.targetCocoaPercent,
    barMassGrams: input.barMassGrams,
    notes: input.notes,
  };
  if (input.start === "copy") {
    const source = await getRecipe({ workspaceId, recipeId: input.copyFromRecipeId!, executor }).catch((err: unknown) => {
      if (err instanceof AppError && err.code === "not_found") {
        throw invalid("Check the highlighted fields.", { copyFromRecipeId: ["That recipe was not found."] });
      }
      throw err;
    });
    if (source.latestVersionNo === 0) throw invalid("Check the highlighted fields.", { copyFromRecipeId: ["That recipe has no saved version to copy yet."] });
    return copyVersion({ workspaceId, userId, executor, recipeId: source.id, versionNo: source.latestVersionNo, fields: base });
  }
  if (input.start === "starting_point") {
    const point = findStartingPoint(input.startingPointKey ?? "");
    if (!point) throw invalid("Check the highlighted fields.", { startingPointKey: ["Choose one of the starting points."] });
    return inTransaction(executor, async (tx) => {
      const ids = await ensureReferenceIngredients({ workspaceId, keys: point.lines.map((l) => l.referenceKey), executor: tx });
      const recipeId = await insertRecipe(tx, {
        workspaceId,
        createdById: userId,
        fields: { ...base, origin: "starting_point", startingPointKey: point.key },
      });
      await saveRecipeVersion({
        workspaceId,
        authorId: userId,
        recipeId,
        baseVersionNo: 0,
        note: `Started from “${point.name}”.`,
        barMassGrams: input.barMassGrams,
        lines: point.lines.map((l) => ({ ingredientId: ids.get(l.referenceKey)!, percent: l.percent })),
        executor: tx,
      });
      return { recipeId };
    });
  }
  const recipeId = await inTransaction(executor, (tx) => insertRecipe(tx, { workspaceId, createdById: userId, fields: { ...base, origin: "scratch" } }));
  return { recipeId };
}

/**
 * A new recipe whose v1 has the lines of another recipe's version (fork, copy).
 * Name, type and target default to the source's; the figures are recomputed
 * with today's ingredient data and prices like any save.
 */
export async function copyVersion({
  workspaceId,
  userId,
  executor,
  recipeId,
  versionNo,
  fields,
}: Who & {
  recipeId: string;
  versionNo: number;
  fields: { name: string; chocolateType?: CreateRecipeInput["chocolateType"]; targetCocoaPercent?: string; barMassGrams?: string; notes?: string };
}): Promise<{ recipeId: string }> {
  const source = await getRecipe({ workspaceId, recipeId, executor });
  const version = await getVersion({ workspaceId, recipeId, versionNo, executor });
  return inTransaction(executor, async (tx) => {
    const newId = await insertRecipe(tx, {
      workspaceId,
      createdById: userId,
      fields: {
        name: fields.name,
        chocolateType: fields.chocolateType ?? source.chocolateType,
        targetCocoaPercent: fields.targetCocoaPercent ?? source.targetCocoaPercent ?? undefined,
        barMassGrams: fields.barMassGrams ?? version.barMassGrams,
        notes: fields.notes,
        origin: "copy",
        copiedFromRecipeId: source.id,
        copiedFromVersionNo: versionNo,
      },
    });
    await saveRecipeVersion({
      workspaceId,
      authorId: userId,
      recipeId: newId,
      baseVersionNo: 0,
      note: `Copied from “${source.name}” v${versionNo}.`,
      barMassGrams: fields.barMassGrams ?? version.barMassGrams,
      lines: version.lines.map((l) => ({ ingredientId: l.ingredientId, percent: l.percent })),
      executor: tx,
    });
    return { recipeId: newId };
  });
}

/**
 * Restores an old version as a new one (nothing is rewritten): its lines and bar
 * mass, saved on top of `baseVersionNo` with the usual concurrency check.
 */
export async function restoreVersion({
  workspaceId,
  userId,
  recipeId,
  versionNo,
  baseVersionNo,
}: Who & { recipeId: string; versionNo: number; baseVersionNo: number }): Promise<{ versionNo: number }> {
  const old = await getVersion({ workspaceId, recipeId, versionNo });
  if (versionNo === baseVersionNo) throw invalid(`v${versionNo} is already the latest version.`);
  return saveRecipeVersion({
    workspaceId,
    authorId: userId,
    recipeId,
    baseVersionNo,
    note: `Restored from v${versionNo}.`,
    barMassGrams: old.barMassGrams,
    lines: old.lines.map((l) => ({ ingredientId: l.ingredientId, percent: l.percent })),
    restoredFromVersionNo: versionNo,
  });
}

