import {
  addedSugarsOf,
  findDefaultIngredient,
  findLabelNames,
  findLabelNutrients,
  type NutritionLine,
  type RecipeLine,
  type StatementLine,
} from "@/lib/formulation";

/** A reference ingredient as every label function takes it: engine spec, nutrients, names, allergens. */
export interface LabelFixtureLine {
  key: string;
  percent: string;
}

// Allergen codes as the ingredient library stores them (Regulation (EU) No 1169/2011 Annex II):
// milk powders carry milk (point 7), soy lecithin soybeans (point 6).
const ALLERGENS: Record<string, string[]> = { "whole-milk-powder": ["milk"], "skim-milk-powder": ["milk"], "buttermilk-powder": ["milk"], "soy-lecithin": ["soybeans"] };

function must<T>(value: T | undefined, what: string): T {
  if (value === undefined) throw new Error(`fixture: no ${what}`);
  return value;
}

export function engineLines(lines: LabelFixtureLine[]): RecipeLine[] {
  return lines.map((l) => ({ ingredient: must(findDefaultIngredient(l.key), l.key), percent: l.percent }));
}

export function nutritionLines(lines: LabelFixtureLine[]): NutritionLine[] {
  return lines.map((l) => {
    const spec = must(findDefaultIngredient(l.key), l.key);
    const n = must(findLabelNutrients(l.key), l.key).nutrients;
    return { name: spec.name, percent: l.percent, nutrients: { ...n, addedSugars: addedSugarsOf(spec.sugar ?? 0, n.sugars) } };
  });
}

export function statementLines(lines: LabelFixtureLine[]): StatementLine[] {
  return lines.map((l) => {
    const names = must(findLabelNames(l.key), l.key);
    return { name: names.eu, usName: names.us, percent: l.percent, allergens: ALLERGENS[l.key] ?? [] };
  });
}

/** The 70 % dark of the engine's worked examples: 65 nibs, 5 cocoa butter, 29.5 sugar, 0.5 lecithin. */
export const DARK_70: LabelFixtureLine[] = [
  { key: "cocoa-nibs", percent: "65" },
  { key: "cocoa-butter", percent: "5" },
  { key: "sucrose", percent: "29.5" },
  { key: "soy-lecithin", percent: "0.5" },
];

/** A 45 % milk: 37 nibs, 9 cocoa butter, 24 whole milk powder, 29.6 sugar, 0.4 lecithin. */
export const MILK_45: LabelFixtureLine[] = [
  { key: "cocoa-nibs", percent: "37" },
  { key: "cocoa-butter", percent: "9" },
  { key: "whole-milk-powder", percent: "24" },
  { key: "sucrose", percent: "29.6" },
  { key: "soy-lecithin", percent: "0.4" },
];
