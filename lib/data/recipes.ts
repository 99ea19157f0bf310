import "server-only";
import { and, desc, eq, gt } from "drizzle-orm";
import { db } from "@/db/client";
import { recipes, type ChocolateType, type RecipeOrigin } from "@/db/schema";
import { invalid, notFound } from "@/lib/errors";
import type { Executor } from "./recipes-db";
import { isUniqueViolation } from "./pg-errors";

export type RecipeRecord = {
  id: string;
  name: string;
  chocolateType: ChocolateType;
  targetCocoaPercent: string | null;
  notes: string | null;
  origin: RecipeOrigin;
  startingPointKey: string | null;
  copiedFromRecipeId: string | null;
  copiedFromVersionNo: number | null;
  barMassGrams: string;
  latestVersionNo: number;
  cocoaPercent: string | null;
  costPerBar: string | null;
  releasedVersionNo: number | null;
  releasedAt: Date | null;
  createdAt: Date;
  updatedAt: Date;
};

const recordColumns = {
  id: recipes.id,
  name: recipes.name,
  chocolateType: recipes.chocolateType,
  targetCocoaPercent: recipes.targetCocoaPercent,
  notes: recipes.notes,
  origin: recipes.origin,
  startingPointKey: recipes.startingPointKey,
  copiedFromRecipeId: recipes.copiedFromRecipeId,
  copiedFromVersionNo: recipes.copiedFromVersionNo,
  barMassGrams: recipes.barMassGrams,
  latestVersionNo: recipes.latestVersionNo,
  cocoaPercent: recipes.cocoaPercent,
  costPerBar: recipes.costPerBar,
  releasedVersionNo: recipes.releasedVersionNo,
  releasedAt: recipes.releasedAt,
  createdAt: recipes.createdAt,
  updatedAt: recipes.updatedAt,
};

/** One recipe of the workspace, or not_found (also for another workspace's id). */
export async function getRecipe({
  workspaceId,
  recipeId,
  executor = db,
}: {
  workspaceId: string;
  recipeId: string;
  executor?: Executor;
}): Promise<RecipeRecord> {
  const [row] = await executor
    .select(recordColumns)
    .from(recipes)
    .where(and(eq(recipes.workspaceId, workspaceId), eq(recipes.id, recipeId)));
  if (!row) throw notFound("That recipe");
  return row;
}

/** The recipe's row, locked until the transaction ends: saves and releases of one recipe queue here. */
export async function lockRecipe(tx: Executor, { workspaceId, recipeId }: { workspaceId: string; recipeId: string }): Promise<RecipeRecord> {
  const [row] = await tx
    .select(recordColumns)
    .from(recipes)
    .where(and(eq(recipes.workspaceId, workspaceId), eq(recipes.id, recipeId)))
    .for("update");
  if (!row) throw notFound("That recipe");
  return row;
}

export type NewRecipeFields = {
  name: string;
  chocolateType: ChocolateType;
  targetCocoaPercent?: string;
  barMassGrams: string;
  notes?: string;
  origin: RecipeOrigin;
  startingPointKey?: string;
  copiedFromRecipeId?: string;
  copiedFromVersionNo?: number;
};

const nameTaken = () => invalid("Check the highlighted fields.", { name: ["A recipe with this name already exists. Choose another name."] });

/** Inserts a recipe with no version yet; a taken name is a field error. */
export async function insertRecipe(
  tx: Executor,
  { workspaceId, createdById, fields }: { workspaceId: string; createdById: string | null; fields: NewRecipeFields },
): Promise<string> {
  try {
    const [row] = await tx
      .insert(recipes)
      .values({ ...fields, workspaceId, createdById })
      .returning({ id: recipes.id });
    return row!.id;
  } catch (err) {
    if (isUniqueViolation(err, "recipes_workspace_name")) throw nameTaken();
    throw err;
  }
}

/** Renames a recipe or changes its type, target or notes (these are not versioned). */
export async function updateRecipeDetails({
  workspaceId,
  recipeId,
  details,
}: {
  workspaceId: string;
  recipeId: string;
  details: { name: string; chocolateType: ChocolateType; targetCocoaPercent?: string; notes?: string };
}): Promise<void> {
  try {
    const updated = await db
      .update(recipes)
      .set({ ...details, targetCocoaPercent: details.targetCocoaPercent ?? null, notes: details.notes ?? null })
      .where(and(eq(recipes.workspaceId, workspaceId), eq(recipes.id, recipeId)))
      .returning({ id: recipes.id });
    if (updated.length === 0) throw notFound("That recipe");
  } catch (err) {
    if (isUniqueViolation(err, "recipes_workspace_name")) throw nameTaken();
    throw err;
  }
}

/** The most recently changed recipes that have a version, to pick one to copy. */
export async function listRecipeChoices({ workspaceId, limit = 200 }: { workspaceId: string; limit?: number }): Promise<{ id: string; name: string; latestVersionNo: number }[]> {
  return db
    .select({ id: recipes.id, name: recipes.name, latestVersionNo: recipes.latestVersionNo })
    .from(recipes)
    .where(and(eq(recipes.workspaceId, workspaceId), gt(recipes.latestVersionNo, 0)))
    .orderBy(desc(recipes.updatedAt))
    .limit(limit);
}
