import type { Decimal } from "decimal.js";
import { HUNDRED, ZERO, describeInput, readDecimal, toDecimalString } from "./decimal";
import { ingredientCostPerKg } from "./cost-per-kg";
import { parseRecipeLines } from "./input";
import type { DecimalInput, RecipeLine } from "./types";

/** Costing inputs. Money in the workspace currency; masses as named. */
export interface CostOptions {
  barMassGrams: DecimalInput;
  /** Mass lost between ingredients and finished bars (refining, conching, tempering), 0 ≤ loss < 100. */
  processLossPercent?: DecimalInput;
  packagingPerBar?: DecimalInput;
  labourPerBar?: DecimalInput;
  /** Per kg of finished chocolate. */
  labourPerKg?: DecimalInput;
  /** Per kg of finished chocolate. */
  overheadPerKg?: DecimalInput;
  overheadPerBar?: DecimalInput;
  /** Bars in one case; a whole number ≥ 1. */
  barsPerCase?: DecimalInput;
}

/** Cost of one bar by part; the parts sum exactly to costPerBar. */
export interface CostBreakdown {
  ingredients: string;
  /** Extra ingredient cost from the process loss. */
  processLoss: string;
  labour: string;
  overhead: string;
  packaging: string;
}

/** Costing outcome: unrounded decimal strings (round with roundMoney for display). */
export type CostResult =
  | {
      ok: true;
      /** Ingredient cost per kg of recipe going in. */
      ingredientCostPerKg: string;
      /** Ingredient cost per kg of finished chocolate: ingredientCostPerKg ÷ (1 − loss). */
      costPerKgFinished: string;
      costPerBar: string;
      costPerCase?: string;
      breakdown: CostBreakdown;
    }
  | { ok: false; reason: string; missingPriceLines?: number[] };

type Amounts = Record<"bar" | "loss" | "packaging" | "labourBar" | "labourKg" | "overheadKg" | "overheadBar", Decimal>;

const OPTION_NAMES: ReadonlyArray<[keyof Amounts, keyof CostOptions, string]> = [
  ["bar", "barMassGrams", "The bar mass"],
  ["loss", "processLossPercent", "The process loss"],
  ["packaging", "packagingPerBar", "Packaging per bar"],
  ["labourBar", "labourPerBar", "Labour per bar"],
  ["labourKg", "labourPerKg", "Labour per kg"],
  ["overheadKg", "overheadPerKg", "Overhead per kg"],
  ["overheadBar", "overheadPerBar", "Overhead per bar"],
];

/** Reads the amounts of CostOptions: each a number ≥ 0, missing = 0 (the bar mass is required). */
function readAmounts(options: Partial<CostOptions>): Amounts | string {
  const amounts = {} as Amounts;
  for (const [key, option, name] of OPTION_NAMES) {
    const read = readDecimal(options[option]);
    if (!read.ok && read.problem === "missing" && key !== "bar") amounts[key] = ZERO;
    else if (!read.ok || read.value.isNegative()) return `${name} ${describeInput(options[option])} must be a number of at least 0.`;
    else amounts[key] = read.value;
  }
  if (amounts.bar.isZero()) return "The bar mass must be above 0 g.";
  if (amounts.loss.gte(HUNDRED)) return "The process loss must be below 100 %.";
  return amounts;
}

/**
 * Costs a recipe (lines with ingredient.pricePerKg): per kg going in, per kg of finished
 * chocolate after process loss, per bar and per case, with a per-bar breakdown.
 * costPerBar = bar kg × (costPerKgFinished + labourPerKg + overheadPerKg) + packagingPerBar +
 * labourPerBar + overheadPerBar. All exact decimals (the loss division aside, 64 digits). Fails with a reason,
 * and the indexes of lines without a price, instead of guessing a missing price.
 */
export function costRecipe(lines: readonly RecipeLine[], options: CostOptions): CostResult {
  const parsed = parseRecipeLines({ lines }, []);
  const cost = ingredientCostPerKg(parsed);
  if (!cost.ok) {
    if (cost.missing.length === 0) return { ok: false, reason: "The recipe has no mass to cost." };
    return {
      ok: false,
      reason: `No price per kg for ${cost.missing.map((line) => line.label).join(", ")}.`,
      missingPriceLines: cost.missing.map((line) => line.index),
    };
  }
  const o: Partial<CostOptions> = typeof options === "object" && options !== null ? options : {};
  const v = readAmounts(o);
  if (typeof v === "string") return { ok: false, reason: v };
  const barKg = v.bar.div(1000);
  const finished = cost.perKg.times(HUNDRED).div(HUNDRED.minus(v.loss));
  const parts = {
    ingredients: barKg.times(cost.perKg),
    processLoss: barKg.times(finished.minus(cost.perKg)),
    labour: barKg.times(v.labourKg).plus(v.labourBar),
    overhead: barKg.times(v.overheadKg).plus(v.overheadBar),
    packaging: v.packaging,
  };
  const perBar = parts.ingredients.plus(parts.processLoss).plus(parts.labour).plus(parts.overhead).plus(parts.packaging);
  const result: CostResult = {
    ok: true,
    ingredientCostPerKg: toDecimalString(cost.perKg),
    costPerKgFinished: toDecimalString(finished),
    costPerBar: toDecimalString(perBar),
    breakdown: {
      ingredients: toDecimalString(parts.ingredients),
      processLoss: toDecimalString(parts.processLoss),
      labour: toDecimalString(parts.labour),
      overhead: toDecimalString(parts.overhead),
      packaging: toDecimalString(parts.packaging),
    },
  };
  if (o.barsPerCase !== undefined) {
    const bars = readDecimal(o.barsPerCase);
    if (!bars.ok || !bars.value.isInteger() || bars.value.lt(1)) return { ok: false, reason: `Bars per case ${describeInput(o.barsPerCase)} must be a whole number of at least 1.` };
    result.costPerCase = toDecimalString(perBar.times(bars.value));
  }
  return result;
}
