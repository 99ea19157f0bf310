import type { Decimal } from "decimal.js";
import { Dec, HUNDRED, ZERO, describeInput, displayQuotient, readDecimal, toDecimalString } from "./decimal";
import { EU_ENERGY_FACTORS, SALT_PER_SODIUM, US_GENERAL_FACTORS } from "./reference/nutrition-factors";
import type { DecimalInput } from "./types";

/**
 * Nutrition of a recipe per 100 g of product and per portion, unrounded (rounding for the label
 * is in label-rounding-eu.ts and label-rounding-us.ts). Amounts are mass-weighted means of the
 * ingredients' figures over the recipe at mixing (moisture lost in conching is not modelled).
 */

/** The nutrients an ingredient carries, g per 100 g of it. */
export const NUTRIENTS = ["fat", "saturates", "carbohydrateByDifference", "sugars", "addedSugars", "fibre", "protein", "salt"] as const;
export type Nutrient = (typeof NUTRIENTS)[number];

/**
 * An ingredient's nutrients, g per 100 g; a missing one is *unknown* (reported, counted as 0).
 * `carbohydrateByDifference` is USDA's figure, fibre included (US "total carbohydrate");
 * `addedSugars` are the sugars it adds as a sweetener (21 CFR 101.9(c)(6)(iii)).
 */
export type NutrientProfile = Partial<Record<Nutrient, DecimalInput>>;

/** One line of a recipe for nutrition: the ingredient's name, its share and its nutrients. */
export interface NutritionLine {
  name: string;
  percent: DecimalInput;
  nutrients: NutrientProfile;
}

/** A nutrient some lines with mass do not give. */
export interface MissingNutrient {
  nutrient: Nutrient;
  /** Names of the lines without a figure for it. */
  lines: string[];
}

/** Amounts per 100 g (or per portion) as decimal strings, energy included. */
export interface NutritionAmounts {
  fat: string;
  saturates: string;
  /** Total carbohydrate (USDA by difference, fibre included), the US declaration's figure. */
  carbohydrateByDifference: string;
  /** Available carbohydrate = total − fibre: the EU declaration's "carbohydrate". */
  carbohydrateAvailable: string;
  sugars: string;
  addedSugars: string;
  fibre: string;
  protein: string;
  salt: string;
  /** Sodium in mg = salt ÷ 2.5 × 1000 (Regulation (EU) No 1169/2011 Annex I point 11). */
  sodiumMg: string;
  /** Regulation (EU) No 1169/2011 Annex XIV factors on unrounded amounts. */
  energyKj: string;
  energyKcal: string;
  /** 21 CFR 101.9(c)(1)(i)(B): 4 × protein + 4 × total carbohydrate + 9 × fat, unrounded. */
  usEnergyKcal: string;
}

export interface NutritionResult {
  per100g: NutritionAmounts;
  missing: MissingNutrient[];
  /** Lines whose figures could not be read, and other problems, as sentences. */
  warnings: string[];
}

const ZEROS = (): Record<Nutrient, Decimal> => ({ fat: ZERO, saturates: ZERO, carbohydrateByDifference: ZERO, sugars: ZERO, addedSugars: ZERO, fibre: ZERO, protein: ZERO, salt: ZERO });

function readPercent(line: NutritionLine, warnings: string[]): Decimal {
  const read = readDecimal(line.percent);
  if (read.ok && !read.value.isNegative()) return read.value;
  warnings.push(`${line.name}: percent ${describeInput(line.percent)} is not a number of at least 0; counted as 0 %.`);
  return ZERO;
}

/** Energy and derived amounts from amounts of the energy-yielding nutrients (any mass unit). */
export function withEnergy(amounts: Record<Nutrient, Decimal>): NutritionAmounts {
  const { fat, protein, fibre } = amounts;
  const total = amounts.carbohydrateByDifference;
  const available = Dec.max(total.minus(fibre), ZERO);
  const eu = EU_ENERGY_FACTORS;
  const kj = fat.times(eu.fat.kj).plus(available.times(eu.carbohydrate.kj)).plus(protein.times(eu.protein.kj)).plus(fibre.times(eu.fibre.kj));
  const kcal = fat.times(eu.fat.kcal).plus(available.times(eu.carbohydrate.kcal)).plus(protein.times(eu.protein.kcal)).plus(fibre.times(eu.fibre.kcal));
  const us = US_GENERAL_FACTORS;
  const usKcal = protein.times(us.protein).plus(total.times(us.carbohydrate)).plus(fat.times(us.fat));
  const out = {} as Record<Nutrient, string>;
  for (const n of NUTRIENTS) out[n] = toDecimalString(amounts[n]);
  return {
    ...out,
    carbohydrateAvailable: toDecimalString(available),
    sodiumMg: toDecimalString(amounts.salt.times(1000).div(SALT_PER_SODIUM.value)),
    energyKj: toDecimalString(kj),
    energyKcal: toDecimalString(kcal),
    usEnergyKcal: toDecimalString(usKcal),
  };
}

/**
 * Nutrition per 100 g of the product: Σ percent × amount per 100 g ÷ Σ percent (percents that
 * do not sum to 100 are read as parts), energy from the unrounded amounts. Never throws: a bad
 * percent or figure counts as 0 with a warning; a missing figure on a line with mass is listed
 * in `missing` (and counted as 0), so the caller can say the declaration is incomplete.
 */
export function computeNutrition(lines: readonly NutritionLine[]): NutritionResult {
  const warnings: string[] = [];
  const sums = ZEROS();
  const missing = new Map<Nutrient, string[]>();
  let total = ZERO;
  for (const line of lines) {
    const p = readPercent(line, warnings);
    if (p.isZero()) continue;
    total = total.plus(p);
    for (const n of NUTRIENTS) {
      const raw = line.nutrients[n];
      const read = readDecimal(raw);
      if (!read.ok && read.problem === "missing") {
        // Added sugars unknown = none added (a line that is not a sweetener); the rest is a gap.
        if (n !== "addedSugars") missing.set(n, [...(missing.get(n) ?? []), line.name]);
        continue;
      }
      if (!read.ok || read.value.isNegative()) {
        warnings.push(`${line.name}: ${n} ${describeInput(raw)} is not a number of at least 0; counted as 0 g.`);
        continue;
      }
      sums[n] = sums[n].plus(p.times(read.value));
    }
  }
  const per100 = ZEROS();
  if (total.gt(ZERO)) for (const n of NUTRIENTS) per100[n] = total.eq(HUNDRED) ? sums[n].div(HUNDRED) : displayQuotient(sums[n], total);
  if (per100.fibre.gt(per100.carbohydrateByDifference)) warnings.push("Fibre exceeds total carbohydrate; available carbohydrate is counted as 0 g.");
  return {
    per100g: withEnergy(per100),
    missing: NUTRIENTS.flatMap((nutrient) => (missing.has(nutrient) ? [{ nutrient, lines: missing.get(nutrient)! }] : [])),
    warnings,
  };
}

/**
 * Amounts in a portion of `grams`: each per-100 g amount × grams ÷ 100, energy recomputed from
 * the portion's unrounded amounts (the same as scaling it). Null when grams is not a number > 0.
 */
export function nutritionForPortion(per100g: NutritionAmounts, grams: DecimalInput): NutritionAmounts | null {
  const g = readDecimal(grams);
  if (!g.ok || !g.value.gt(ZERO)) return null;
  const factor = g.value.div(HUNDRED);
  const amounts = ZEROS();
  for (const n of NUTRIENTS) amounts[n] = new Dec(per100g[n]).times(factor);
  return withEnergy(amounts);
}

/**
 * Added sugars of an ingredient, g per 100 g: its added sweetener (the composition's `sugar`)
 * capped at its total sugars, so lactose in milk powder never counts (21 CFR 101.9(c)(6)(iii)).
 * Undefined when either is unknown or not a number.
 */
export function addedSugarsOf(sweetener: DecimalInput | null | undefined, sugars: DecimalInput | null | undefined): string | undefined {
  const s = readDecimal(sweetener);
  const t = readDecimal(sugars);
  if (!s.ok || !t.ok) return undefined;
  return toDecimalString(Dec.max(ZERO, Dec.min(s.value, t.value)));
}
