import { nutritionForPortion, type NutritionAmounts } from "./nutrition";
import { percentDailyValue, roundUsCalories, roundUsFat, roundUsGrams, roundUsSodium } from "./label-rounding-us";
import type { Declared } from "./label-rounding-eu";
import { US_DAILY_VALUES } from "./reference/nutrition-factors";
import type { UsServing } from "./serving-size-us";

/** One column's figure of a row: the declared amount and its % Daily Value when it has one. */
export interface UsPanelCell {
  amount: string;
  percentDailyValue?: string;
}

/** One nutrient row, in the order of 21 CFR 101.9(c) and (d). */
export interface UsPanelRow {
  key: string;
  label: string;
  /** 0: a main nutrient; 1: under total fat or carbohydrate; 2: "Includes … Added Sugars". */
  indent: 0 | 1 | 2;
  /** Per serving, and per package on a dual-column label; absent when Barwright has no data. */
  perServing?: UsPanelCell;
  perPackage?: UsPanelCell;
}

export interface UsPanel {
  kind: Extract<UsServing, { ok: true }>["kind"];
  servingSize: string;
  servingsPerContainer: string;
  calories: { perServing: string; perPackage?: string };
  rows: UsPanelRow[];
  /** Rows the label must carry that the ingredient library has no figures for. */
  notComputed: string[];
}

const DV = US_DAILY_VALUES;
type Rule = (a: NutritionAmounts) => { declared: Declared; actual: string; dv?: string };

const COMPUTED: Array<[key: string, label: string, indent: 0 | 1 | 2, rule: Rule]> = [
  ["fat", "Total Fat", 0, (a) => ({ declared: roundUsFat(a.fat), actual: a.fat, dv: DV.fat })],
  ["saturates", "Saturated Fat", 1, (a) => ({ declared: roundUsFat(a.saturates), actual: a.saturates, dv: DV.saturates })],
  ["transFat", "Trans Fat", 1, () => ({ declared: { text: "", value: null }, actual: "" })],
  ["cholesterol", "Cholesterol", 0, () => ({ declared: { text: "", value: null }, actual: "" })],
  ["sodium", "Sodium", 0, (a) => ({ declared: roundUsSodium(a.sodiumMg), actual: a.sodiumMg, dv: DV.sodiumMg })],
  ["carbohydrate", "Total Carbohydrate", 0, (a) => ({ declared: roundUsGrams(a.carbohydrateByDifference), actual: a.carbohydrateByDifference, dv: DV.carbohydrate })],
  ["fibre", "Dietary Fiber", 1, (a) => ({ declared: roundUsGrams(a.fibre), actual: a.fibre, dv: DV.fibre })],
  ["sugars", "Total Sugars", 1, (a) => ({ declared: roundUsGrams(a.sugars), actual: a.sugars })],
  ["addedSugars", "Added Sugars", 2, (a) => ({ declared: roundUsGrams(a.addedSugars), actual: a.addedSugars, dv: DV.addedSugars })],
  // Protein's % DV is required only with a protein claim (21 CFR 101.9(c)(7)(i), from memory).
  ["protein", "Protein", 0, (a) => ({ declared: roundUsGrams(a.protein), actual: a.protein })],
];

/** Mandatory rows we hold no data for: 21 CFR 101.9(c)(2)(ii), (c)(3), (c)(8)(ii). */
const NOT_COMPUTED = new Set(["transFat", "cholesterol"]);
const MICRONUTRIENTS: Array<[key: string, label: string]> = [["vitaminD", "Vitamin D"], ["calcium", "Calcium"], ["iron", "Iron"], ["potassium", "Potassium"]];

function cell(rule: Rule, amounts: NutritionAmounts): UsPanelCell {
  const { declared, actual, dv } = rule(amounts);
  return dv === undefined ? { amount: declared.text } : { amount: declared.text, percentDailyValue: percentDailyValue(declared, actual, dv) };
}

/**
 * The US Nutrition Facts figures for one serving (and the whole package on a dual-column
 * label): calories from 4/4/9 on the serving's unrounded amounts, then every figure rounded by
 * label-rounding-us.ts, % Daily Values from US_DAILY_VALUES. Trans fat, cholesterol and the
 * four micronutrients are listed in `notComputed`: the library holds no figures for them.
 */
export function usNutritionPanel(per100g: NutritionAmounts, serving: Extract<UsServing, { ok: true }>): UsPanel {
  const perServing = nutritionForPortion(per100g, serving.servingGrams)!;
  const perPackage = serving.kind === "dual-column" ? nutritionForPortion(per100g, serving.packageGrams)! : undefined;
  const rows = COMPUTED.map(([key, label, indent, rule]): UsPanelRow => {
    if (NOT_COMPUTED.has(key)) return { key, label, indent };
    const row: UsPanelRow = { key, label, indent, perServing: cell(rule, perServing) };
    if (perPackage) row.perPackage = cell(rule, perPackage);
    return row;
  });
  for (const [key, label] of MICRONUTRIENTS) rows.push({ key, label, indent: 0 });
  const calories: UsPanel["calories"] = { perServing: roundUsCalories(perServing.usEnergyKcal).text };
  if (perPackage) calories.perPackage = roundUsCalories(perPackage.usEnergyKcal).text;
  return {
    kind: serving.kind,
    servingSize: `${serving.householdMeasure} (${serving.servingGrams}g)`,
    servingsPerContainer: serving.servingsPerContainer,
    calories,
    rows,
    notComputed: ["Trans Fat", "Cholesterol", ...MICRONUTRIENTS.map(([, label]) => label)],
  };
}
