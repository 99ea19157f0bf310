/**
 * The engine's reference profiles (lib/formulation DEFAULT_INGREDIENTS) as rows
 * of a workspace's ingredient library. Pure, so both sign-up (lib/data) and the
 * demo seed (db/demo) can use it.
 */
import Decimal from "decimal.js";
import type { IngredientKind, NewIngredient } from "../../db/schema/ingredients";
import { DEFAULT_INGREDIENTS, type IngredientProfile } from "../formulation";

const KIND_BY_KEY: Record<string, IngredientKind> = {
  "cocoa-nibs": "nibs",
  "cocoa-liquor": "cocoa_liquor",
  "cocoa-butter": "cocoa_butter",
  "cocoa-powder-10-12": "cocoa_powder",
};

const KIND_BY_ENGINE_KIND: Record<IngredientProfile["kind"], IngredientKind> = {
  cocoa: "cocoa_liquor",
  "cocoa butter": "cocoa_butter",
  sweetener: "sugar",
  dairy: "milk_powder",
  emulsifier: "lecithin",
  flavouring: "flavouring",
};

// Regulation (EU) 1169/2011 Annex II: milk (point 7) and soybeans (point 6); soy lecithin is not exempt.
const ALLERGENS_BY_KIND: Partial<Record<IngredientKind, string[]>> = { milk_powder: ["milk"] };
const ALLERGENS_BY_KEY: Record<string, string[]> = { "soy-lecithin": ["soybeans"] };

const figure = (v: string | number | undefined): string => (v === undefined ? "0" : new Decimal(v).toFixed());
const nutrient = (v: number | undefined): string | null => (v === undefined ? null : new Decimal(v).toFixed());

/** One reference profile as the columns of an `ingredients` row (without workspace). */
export function referenceIngredientRow(profile: IngredientProfile): Omit<NewIngredient, "workspaceId"> {
  const kind = KIND_BY_KEY[profile.key] ?? KIND_BY_ENGINE_KIND[profile.kind];
  const n = profile.nutrients;
  return {
    name: profile.name,
    kind,
    cocoaButter: figure(profile.cocoaButter),
    cocoaSolidsNonFat: figure(profile.cocoaSolidsNonFat),
    milkFat: figure(profile.milkFat),
    milkSolidsNonFat: figure(profile.milkSolidsNonFat),
    sugar: figure(profile.sugar),
    vegetableFat: figure(profile.vegetableFat),
    moisture: figure(profile.moisture),
    isInclusion: profile.inclusion ?? false,
    fat: nutrient(n.fat),
    saturatedFat: nutrient(n.saturates),
    carbohydrate: nutrient(n.carbohydrateByDifference),
    sugars: nutrient(n.sugars),
    fibre: nutrient(n.fibre),
    protein: nutrient(n.protein),
    // Salt = sodium × 2.5 (Regulation (EU) 1169/2011 Annex I point 11); sodium is in mg.
    salt: n.sodiumMg === undefined ? null : new Decimal(n.sodiumMg).times(2.5).div(1000).toFixed(),
    ash: nutrient(n.ash),
    allergens: ALLERGENS_BY_KEY[profile.key] ?? ALLERGENS_BY_KIND[kind] ?? [],
    source: `Barwright reference profile: ${profile.sources.join("; ")}`,
    referenceKey: profile.key,
    notes: null,
  };
}

/** Every reference profile, as library rows. */
export function referenceIngredientRows(): Omit<NewIngredient, "workspaceId">[] {
  return DEFAULT_INGREDIENTS.map(referenceIngredientRow);
}
