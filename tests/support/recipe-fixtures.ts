/**
 * Recipes for integration tests, made through the same data functions the app
 * uses. Ingredient ids come from the engine's reference profiles, added to the
 * test workspace's library on first use.
 */
import { randomBytes } from "node:crypto";
import { db } from "@/db/client";
import { ingredients } from "@/db/schema";
import { createRecipe } from "@/lib/data/recipes-create";
import { ensureReferenceIngredients } from "@/lib/data/recipes-ingredients";

export const uniqueName = (label: string) => `${label} ${randomBytes(3).toString("hex")}`;

/** Library ids of nibs, cocoa butter, sugar, whole milk powder, lecithin and vanilla. */
export async function referenceIds(workspaceId: string) {
  const ids = await ensureReferenceIngredients({
    workspaceId,
    keys: ["cocoa-nibs", "cocoa-butter", "sucrose", "whole-milk-powder", "soy-lecithin", "vanilla"],
  });
  return {
    nibs: ids.get("cocoa-nibs")!,
    butter: ids.get("cocoa-butter")!,
    sugar: ids.get("sucrose")!,
    milk: ids.get("whole-milk-powder")!,
    lecithin: ids.get("soy-lecithin")!,
    vanilla: ids.get("vanilla")!,
  };
}

/** A roasted-hazelnut inclusion (invented figures: 61 % fat counted as vegetable fat, 2 % water). */
export async function hazelnutId(workspaceId: string): Promise<string> {
  const [row] = await db
    .insert(ingredients)
    .values({ workspaceId, name: uniqueName("Roasted hazelnuts"), kind: "inclusion", vegetableFat: "61", moisture: "2", isInclusion: true, allergens: ["nuts"] })
    .returning({ id: ingredients.id });
  return row!.id;
}

/** A 70 % dark recipe with v1 from our starting point. */
export async function darkRecipe(team: { workspaceId: string; people: { formulator: { id: string } } }, name = uniqueName("Dark")) {
  const { recipeId } = await createRecipe({
    workspaceId: team.workspaceId,
    userId: team.people.formulator.id,
    input: { name, chocolateType: "dark", barMassGrams: "70", notes: undefined, start: "starting_point", startingPointKey: "classic-dark-70", targetCocoaPercent: "70" },
  });
  return recipeId;
}

/** Lines of a dark bar with `nibs` % nibs and sugar making up the rest (cocoa butter 7.3, lecithin 0.3). */
export function darkLines(ids: Awaited<ReturnType<typeof referenceIds>>, nibs: string) {
  const sugar = (100 - 7.3 - 0.3 - Number(nibs)).toFixed(1);
  return [
    { ingredientId: ids.nibs, percent: nibs },
    { ingredientId: ids.butter, percent: "7.3" },
    { ingredientId: ids.sugar, percent: sugar },
    { ingredientId: ids.lecithin, percent: "0.3" },
  ];
}
