/**
 * Shapes shared by the bench (browser) and the recipe data functions (server).
 * Figures are decimal strings, as the engine takes and gives them.
 */
import type { ChocolateType } from "@/db/schema/recipes";

export type { ChocolateType };

/** The composition fields of an ingredient, g per 100 g, in the engine's names. */
export const PROFILE_FIELDS = [
  "cocoaButter",
  "cocoaSolidsNonFat",
  "milkFat",
  "milkSolidsNonFat",
  "sugar",
  "vegetableFat",
  "moisture",
] as const;
export type ProfileField = (typeof PROFILE_FIELDS)[number];

/** What the engine needs of an ingredient, plus what a version keeps of it. */
export type IngredientProfile = Record<ProfileField, string> & {
  name: string;
  isInclusion: boolean;
  allergens: string[];
  /** Preferred supplier's current price per kg in base currency; null when there is none. */
  pricePerKg: string | null;
};

/** An ingredient of the library as the bench offers it. */
export type BenchIngredient = IngredientProfile & {
  id: string;
  kind: string;
  archived: boolean;
};

/** One line of the bench's draft. */
export type DraftLine = { ingredientId: string; percent: string; locked: boolean };

/** One line of a saved version: the ingredient as it was at save. */
export type VersionLine = IngredientProfile & { ingredientId: string; percent: string };

/** The bench's unsaved state. */
export type Draft = {
  lines: DraftLine[];
  barMassGrams: string;
};
