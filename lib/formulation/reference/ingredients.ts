import type { IngredientSpec } from "../types";
import { cocoaComposition, dairyComposition, type NutrientsPer100g } from "./derive";

/** What an ingredient is for, in the trade's terms. */
export type IngredientKind = "cocoa" | "cocoa butter" | "sweetener" | "dairy" | "emulsifier" | "flavouring";

/** A default ingredient: composition for the engine, nutrients per 100 g, and where they come from. */
export interface IngredientProfile extends IngredientSpec {
  readonly key: string;
  readonly kind: IngredientKind;
  readonly nutrients: NutrientsPer100g;
  /** USDA FoodData Central entry, "common practice, no single source", or "from memory — verify". */
  readonly sources: readonly string[];
}

const PRACTICE = "common practice, no single source";
const MEMORY = "from memory — verify";

// USDA FoodData Central, SR Legacy, values per 100 g as listed in /work/shared/REFERENCE.md §3.
const LIQUOR_167568: NutrientsPer100g = { water: 1.34, fat: 52.31, protein: 14.32, carbohydrateByDifference: 28.35, fibre: 16.6, sugars: 0.91, ash: 3.6 };
const WHOLE_MILK_POWDER_173454: NutrientsPer100g = { water: 2.47, fat: 26.71, protein: 26.32, carbohydrateByDifference: 38.42, fibre: 0, sugars: 38.42, ash: 6.08 };
const SKIM_MILK_POWDER_170877: NutrientsPer100g = { water: 3.16, fat: 0.77, protein: 36.16, carbohydrateByDifference: 51.98, fibre: 0, sugars: 51.98, ash: 7.93 };

/**
 * Default ingredient profiles. Compositions are g per 100 g; each value's source is beside it
 * and in `sources`. Prices are left to the workspace.
 */
export const DEFAULT_INGREDIENTS: readonly IngredientProfile[] = [
  {
    key: "cocoa-nibs",
    name: "Cocoa nibs (roasted)",
    kind: "cocoa",
    // Cocoa butter 50–57 %, ≈ 55 typical; moisture 1.5–3 % after roasting: common practice.
    ...cocoaComposition({ fat: 55, water: 2 }),
    nutrients: { fat: 55, water: 2 },
    sources: [`composition: ${PRACTICE} (cocoa butter ≈ 55 %, moisture ≈ 2 %; no SR Legacy entry)`],
  },
  {
    key: "cocoa-liquor",
    name: "Cocoa liquor (cocoa mass)",
    kind: "cocoa",
    ...cocoaComposition({ fat: 52.31, water: 1.34 }), // FDC 167568
    nutrients: LIQUOR_167568,
    sources: ["USDA FoodData Central FDC 167568 (Baking chocolate, unsweetened), used as a proxy for cocoa liquor"],
  },
  {
    key: "cocoa-butter",
    name: "Cocoa butter",
    kind: "cocoa butter",
    cocoaButter: 100, // FDC 171421: fat 100 g
    nutrients: { water: 0, fat: 100, saturates: 59.7, protein: 0, carbohydrateByDifference: 0, fibre: 0, sugars: 0, ash: 0 },
    sources: ["USDA FoodData Central FDC 171421 (Oil, cocoa butter)"],
  },
  {
    key: "cocoa-powder-10-12",
    name: "Cocoa powder, 10–12 % fat",
    kind: "cocoa",
    // 11 % = middle of the 10–12 % grade (practice); 3 % moisture from memory (powders are sold at ≤ 5 %).
    ...cocoaComposition({ fat: 11, water: 3 }),
    nutrients: { fat: 11, water: 3 },
    sources: [`cocoa butter: ${PRACTICE} (middle of the 10–12 % grade)`, `moisture: ${MEMORY}`],
  },
  {
    key: "sucrose",
    name: "Sugar (sucrose)",
    kind: "sweetener",
    sugar: 99.98, // FDC 169655: carbohydrate 99.98 g
    moisture: 0.02, // FDC 169655: water 0.02 g
    nutrients: { water: 0.02, fat: 0, protein: 0, carbohydrateByDifference: 99.98, fibre: 0, sugars: 99.91, ash: 0.01 },
    sources: ["USDA FoodData Central FDC 169655 (Sugars, granulated)"],
  },
  {
    key: "whole-milk-powder",
    name: "Whole milk powder",
    kind: "dairy",
    ...dairyComposition({ fat: 26.71, water: 2.47 }), // FDC 173454
    nutrients: WHOLE_MILK_POWDER_173454,
    sources: ["USDA FoodData Central FDC 173454 (Milk, dry, whole)"],
  },
  {
    key: "skim-milk-powder",
    name: "Skim milk powder",
    kind: "dairy",
    ...dairyComposition({ fat: 0.77, water: 3.16 }), // FDC 170877
    nutrients: SKIM_MILK_POWDER_170877,
    sources: [`USDA FoodData Central FDC 170877 (Milk, dry, nonfat): protein seen quoted; other values ${MEMORY}`],
  },
  {
    key: "buttermilk-powder",
    name: "Buttermilk powder",
    kind: "dairy",
    ...dairyComposition({ fat: 5.8, water: 3 }),
    nutrients: { fat: 5.8, water: 3 },
    sources: [`composition: ${MEMORY} (sweet-cream buttermilk powder, fat ≈ 5–6 %, moisture ≈ 3 %)`],
  },
  {
    key: "soy-lecithin",
    name: "Soy lecithin",
    kind: "emulsifier",
    // An emulsifier, not a vegetable fat for Directive 2000/36/EC Art. 2(1): all of it is "other".
    nutrients: { water: 0, fat: 100, protein: 0, carbohydrateByDifference: 0, fibre: 0, sugars: 0, ash: 0 },
    sources: ["USDA SR Legacy 04531 (Lecithin, soybean): fat 100 g for the nutrition declaration"],
  },
  {
    key: "vanilla",
    name: "Vanilla (ground pods)",
    kind: "flavouring",
    // Used at well under 1 %; counted as "other", its water neglected.
    nutrients: {},
    sources: [`${PRACTICE}: counted as "other"; nutrients not given`],
  },
];

/** The default profile with this key, or undefined. */
export function findDefaultIngredient(key: string): IngredientProfile | undefined {
  return DEFAULT_INGREDIENTS.find((profile) => profile.key === key);
}
