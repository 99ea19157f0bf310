import type { IngredientKind } from "@/db/schema/ingredients";

/** How each kind of ingredient is named on screen. */
export const KIND_LABELS: Record<IngredientKind, string> = {
  nibs: "Nibs",
  cocoa_liquor: "Cocoa liquor",
  cocoa_butter: "Cocoa butter",
  cocoa_powder: "Cocoa powder",
  sugar: "Sugar",
  milk_powder: "Milk powder",
  lecithin: "Lecithin",
  flavouring: "Flavouring",
  inclusion: "Inclusion",
  other: "Other",
};

export const kindOptions = Object.entries(KIND_LABELS).map(([value, label]) => ({ value, label }));

/** The engine's composition fields (g per 100 g), in the order a profile is shown. */
export const COMPOSITION_FIELDS = [
  { key: "cocoaButter", label: "Cocoa butter" },
  { key: "cocoaSolidsNonFat", label: "Dry non-fat cocoa solids" },
  { key: "milkFat", label: "Milk fat" },
  { key: "milkSolidsNonFat", label: "Non-fat milk solids" },
  { key: "sugar", label: "Sugar (added sweetener)" },
  { key: "vegetableFat", label: "Vegetable fat (not cocoa butter)" },
  { key: "moisture", label: "Moisture" },
] as const;

export type CompositionKey = (typeof COMPOSITION_FIELDS)[number]["key"];

/** Nutrients per 100 g kept for the nutrition declaration later. */
export const NUTRIENT_FIELDS = [
  { key: "fat", label: "Fat" },
  { key: "saturatedFat", label: "of which saturates" },
  { key: "carbohydrate", label: "Carbohydrate (by difference, incl. fibre)" },
  { key: "sugars", label: "of which sugars" },
  { key: "fibre", label: "Fibre" },
  { key: "protein", label: "Protein" },
  { key: "salt", label: "Salt" },
  { key: "ash", label: "Ash" },
] as const;

export type NutrientKey = (typeof NUTRIENT_FIELDS)[number]["key"];
