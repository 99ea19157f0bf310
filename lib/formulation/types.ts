/**
 * Shared input and output types of the formulation engine.
 *
 * Units: every `percent` is percent by mass of the recipe (parts per 100 parts);
 * every composition field of an ingredient is grams per 100 g of that ingredient;
 * money is in the workspace's currency, per kilogram unless the name says otherwise.
 * Figures leave the engine as decimal strings in plain notation (see decimal.ts).
 */

/** A decimal input: a finite JS number or a decimal string such as "12.5" or "1e-3". */
export type DecimalInput = number | string;

/** The three rule books the standards check knows. */
export type Authority = "EU" | "US" | "Codex";

/** All authorities, in the order results are listed. */
export const AUTHORITIES: readonly Authority[] = ["EU", "US", "Codex"];

/**
 * What a figure is a percentage of.
 * - `eu`: the finished product less inclusion lines (Directive 2000/36/EC Annex I notes).
 * - `codex`: the dry matter of the finished product less inclusion lines (Codex CXS 87-1981 section 2).
 * - `us`: the whole finished product (21 CFR 163).
 */
export type Basis = "eu" | "codex" | "us";

/** How sure we are of a value: see /work/shared/REFERENCE.md for the meaning of each. */
export type SourceStatus = "primary" | "secondary" | "memory" | "practice";

/** Composition of one ingredient, grams per 100 g of it; a missing field counts as 0. */
export interface IngredientComposition {
  /** All cocoa fat. */
  cocoaButter?: DecimalInput;
  /** Dry non-fat (fat-free) cocoa solids: cocoa ingredient less its fat and its water. */
  cocoaSolidsNonFat?: DecimalInput;
  /** Milk fat (dry milk solids, fat part). */
  milkFat?: DecimalInput;
  /** Non-fat milk solids, lactose included (dry milk solids, non-fat part). */
  milkSolidsNonFat?: DecimalInput;
  /** Added sweetener (not the lactose of milk powders). */
  sugar?: DecimalInput;
  /** Fats other than cocoa butter and milk fat (lecithin is not one). */
  vegetableFat?: DecimalInput;
  /** Water. */
  moisture?: DecimalInput;
}

/** One ingredient as the engine sees it. Whatever the fields leave of 100 g is "other". */
export interface IngredientSpec extends IngredientComposition {
  name: string;
  /** An added foodstuff (nuts, fruit, nibs on top) that the standards deduct before their minimums. */
  inclusion?: boolean;
  /** Price per kilogram of the ingredient, in the workspace's currency. */
  pricePerKg?: DecimalInput;
}

/** One line of a recipe: an ingredient and its share of the recipe in percent by mass. */
export interface RecipeLine {
  ingredient: IngredientSpec;
  percent: DecimalInput;
}

/** A recipe: its lines, whose percents should sum to 100. */
export interface Recipe {
  lines: RecipeLine[];
}
