/**
 * Ingredients with round figures for hand-worked least-cost problems. Prices are invented demo
 * figures per kg; compositions as in tests/unit/formulation/fixtures.ts with their sources.
 */
import { loadLpSolver, type IngredientSpec, type LeastCostLine, type LpSolver } from "@/lib/formulation";

// Cocoa butter 55 %, moisture 2 % (REFERENCE.md §3: common practice, no single source);
// dry non-fat cocoa solids = 100 − 55 − 2 = 43 (Directive 2000/36/EC Annex I definition).
export const NIBS: IngredientSpec = { name: "Cocoa nibs", cocoaButter: 55, cocoaSolidsNonFat: 43, moisture: 2, pricePerKg: "9" };
export const COCOA_BUTTER: IngredientSpec = { name: "Cocoa butter", cocoaButter: 100, pricePerKg: "14" };
export const SUGAR: IngredientSpec = { name: "Sugar", sugar: 100, pricePerKg: "1.2" };
// Lecithin is an emulsifier, not a vegetable fat: all of it counts as "other" (issue 3).
export const LECITHIN: IngredientSpec = { name: "Soy lecithin", pricePerKg: "6" };
// Cocoa powder of the 10–12 % grade: 11 % butter, 3 % moisture (REFERENCE.md §3, practice / memory).
export const POWDER: IngredientSpec = { name: "Cocoa powder", cocoaButter: 11, cocoaSolidsNonFat: 86, moisture: 3, pricePerKg: "5" };

/** A least-cost line. */
export const line = (ingredient: IngredientSpec, percent: number | string, extra: Partial<LeastCostLine> = {}): LeastCostLine => ({ ingredient, percent, ...extra });

/** The solver, loaded once for the whole file. */
export function solver(): Promise<LpSolver> {
  return loadLpSolver();
}

/** |a − b| ≤ tolerance, for the solver's float figures. */
export const near = (actual: string | number, expected: number, tolerance = 1e-5): boolean => Math.abs(Number(actual) - expected) <= tolerance;
