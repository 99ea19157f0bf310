import "server-only";
import Decimal from "decimal.js";
import { and, eq, inArray } from "drizzle-orm";
import { db } from "@/db/client";
import { ingredients, recipeLabels } from "@/db/schema";
import type { LabelSettingsInput } from "@/lib/validation/labels";
import { getRecipe } from "./recipes";

/** A recipe's label settings; every field null until someone fills them in. */
export type LabelSettings = {
  mayContain: string | null;
  piecesPerBar: number | null;
  euPortionGrams: string | null;
  updatedAt: Date | null;
};

const EMPTY: LabelSettings = { mayContain: null, piecesPerBar: null, euPortionGrams: null, updatedAt: null };

// numeric(8,2) reads back as "35.00": show it as typed ("35").
const plain = (row: LabelSettings): LabelSettings => ({ ...row, euPortionGrams: row.euPortionGrams === null ? null : new Decimal(row.euPortionGrams).toFixed() });

/** The label settings of a recipe of the workspace (empty ones when never saved). */
export async function getLabelSettings({ workspaceId, recipeId }: { workspaceId: string; recipeId: string }): Promise<LabelSettings> {
  const [row] = await db
    .select({ mayContain: recipeLabels.mayContain, piecesPerBar: recipeLabels.piecesPerBar, euPortionGrams: recipeLabels.euPortionGrams, updatedAt: recipeLabels.updatedAt })
    .from(recipeLabels)
    .where(and(eq(recipeLabels.workspaceId, workspaceId), eq(recipeLabels.recipeId, recipeId)));
  return row ? plain(row) : EMPTY;
}

/**
 * Saves the label settings of a recipe: one row per recipe, replaced on each save.
 * Another workspace's recipe (or none) is not_found.
 */
export async function saveLabelSettings({ workspaceId, userId, input }: { workspaceId: string; userId: string; input: LabelSettingsInput }): Promise<LabelSettings> {
  await getRecipe({ workspaceId, recipeId: input.recipeId });
  const values = { mayContain: input.mayContain, piecesPerBar: input.piecesPerBar, euPortionGrams: input.euPortionGrams, updatedById: userId };
  const [row] = await db
    .insert(recipeLabels)
    .values({ recipeId: input.recipeId, workspaceId, ...values })
    .onConflictDoUpdate({ target: recipeLabels.recipeId, set: { ...values, updatedAt: new Date() }, setWhere: eq(recipeLabels.workspaceId, workspaceId) })
    .returning({ mayContain: recipeLabels.mayContain, piecesPerBar: recipeLabels.piecesPerBar, euPortionGrams: recipeLabels.euPortionGrams, updatedAt: recipeLabels.updatedAt });
  return plain(row!);
}

/** Nutrients per 100 g of a library ingredient as stored (null = not known), with its reference key. */
export type LabelIngredient = {
  id: string;
  name: string;
  referenceKey: string | null;
  fat: string | null;
  saturatedFat: string | null;
  carbohydrate: string | null;
  sugars: string | null;
  fibre: string | null;
  protein: string | null;
  salt: string | null;
};

/** The library's current nutrient figures for the given ingredients of the workspace, by id. */
export async function listLabelIngredients({ workspaceId, ingredientIds }: { workspaceId: string; ingredientIds: string[] }): Promise<Map<string, LabelIngredient>> {
  if (ingredientIds.length === 0) return new Map();
  const rows = await db
    .select({
      id: ingredients.id,
      name: ingredients.name,
      referenceKey: ingredients.referenceKey,
      fat: ingredients.fat,
      saturatedFat: ingredients.saturatedFat,
      carbohydrate: ingredients.carbohydrate,
      sugars: ingredients.sugars,
      fibre: ingredients.fibre,
      protein: ingredients.protein,
      salt: ingredients.salt,
    })
    .from(ingredients)
    .where(and(eq(ingredients.workspaceId, workspaceId), inArray(ingredients.id, ingredientIds)));
  return new Map(rows.map((r) => [r.id, r]));
}
