import { Dec, HUNDRED, toDecimalString } from "../decimal";
import type { IngredientComposition } from "../types";

/** Energy-yielding and proximate nutrients per 100 g, as USDA FoodData Central reports them. */
export interface NutrientsPer100g {
  water?: number;
  fat?: number;
  /** Saturated fatty acids. */
  saturates?: number;
  protein?: number;
  /** Carbohydrate by difference, fibre included (USDA's figure; EU "carbohydrate" is this minus fibre). */
  carbohydrateByDifference?: number;
  fibre?: number;
  sugars?: number;
  ash?: number;
  /** Sodium in mg; salt = sodium × 2.5 (Regulation (EU) 1169/2011 Annex I). */
  sodiumMg?: number;
}

function rest(fat: number, water: number): string {
  return toDecimalString(HUNDRED.minus(new Dec(fat)).minus(new Dec(water)));
}

/**
 * Composition of a milk powder from its nutrients: milkFat = fat, moisture = water and
 * milkSolidsNonFat = 100 − fat − water (lactose, protein and ash are all non-fat milk solids).
 * Exact decimal arithmetic; fields as decimal strings.
 */
export function dairyComposition(n: { fat: number; water: number }): IngredientComposition {
  return { milkFat: toDecimalString(new Dec(n.fat)), moisture: toDecimalString(new Dec(n.water)), milkSolidsNonFat: rest(n.fat, n.water) };
}

/**
 * Composition of a cocoa ingredient from its nutrients: cocoaButter = fat, moisture = water and
 * cocoaSolidsNonFat = 100 − fat − water (Directive 2000/36/EC Annex I: dry non-fat cocoa solids
 * are what remains of the cocoa ingredient without its fat and water).
 */
export function cocoaComposition(n: { fat: number; water: number }): IngredientComposition {
  return { cocoaButter: toDecimalString(new Dec(n.fat)), moisture: toDecimalString(new Dec(n.water)), cocoaSolidsNonFat: rest(n.fat, n.water) };
}
