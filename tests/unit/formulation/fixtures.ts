/**
 * Hand-made ingredients for the worked examples, with round figures so every result can be
 * checked by hand. Sources beside each value.
 */
import type { Evaluation, IngredientSpec, RecipeLine } from "@/lib/formulation";

// Cocoa butter 55 %, moisture 2 % (REFERENCE.md §3: common practice, no single source);
// dry non-fat cocoa solids = 100 − 55 − 2 = 43 (Directive 2000/36/EC Annex I definition).
export const NIBS: IngredientSpec = { name: "Cocoa nibs", cocoaButter: 55, cocoaSolidsNonFat: 43, moisture: 2 };
export const COCOA_BUTTER: IngredientSpec = { name: "Cocoa butter", cocoaButter: 100 };
export const SUGAR: IngredientSpec = { name: "Sugar", sugar: 100 };
// Lecithin is an emulsifier, not a vegetable fat: all of it counts as "other" (issue 3).
export const LECITHIN: IngredientSpec = { name: "Soy lecithin" };
// Round figures near USDA FDC 173454 (fat 26.71, water 2.47): milk fat 26, non-fat 72, water 2.
export const WHOLE_MILK_POWDER: IngredientSpec = { name: "Whole milk powder", milkFat: 26, milkSolidsNonFat: 72, moisture: 2 };
// An inclusion: its own fat and water must not reach any standards figure.
export const HAZELNUTS: IngredientSpec = { name: "Roasted hazelnuts", inclusion: true, vegetableFat: 60, moisture: 5 };

/** A recipe line. */
export const line = (ingredient: IngredientSpec, percent: number | string): RecipeLine => ({ ingredient, percent });

/** "EU chocolate" → pass, for every category evaluated. */
export function passTable(evaluation: Evaluation): Record<string, boolean> {
  return Object.fromEntries(evaluation.standards.map((s) => [`${s.authority} ${s.category}`, s.pass]));
}

/** Every category of every authority, all failing: tests override the ones that pass. */
export const ALL_FAIL: Readonly<Record<string, boolean>> = {
  "EU chocolate": false,
  "EU couverture chocolate": false,
  "EU milk chocolate": false,
  "EU couverture milk chocolate": false,
  "EU family milk chocolate": false,
  "EU white chocolate": false,
  "US sweet chocolate": false,
  "US semisweet chocolate": false,
  "US milk chocolate": false,
  "US white chocolate": false,
  "Codex chocolate": false,
  "Codex sweet chocolate": false,
  "Codex couverture chocolate": false,
  "Codex milk chocolate": false,
  "Codex family milk chocolate": false,
  "Codex milk chocolate couverture": false,
  "Codex white chocolate": false,
};
