import type { Decimal } from "decimal.js";
import { Dec, readDecimal } from "./decimal";
import { roundToStep, type Declared } from "./label-rounding-eu";
import type { DecimalInput } from "./types";

/**
 * Rounding for the US Nutrition Facts label: 21 CFR 101.9(c) as tabulated in the FDA Food
 * Labeling Guide, Appendix H (REFERENCE.md §4: primary). "Nearest" rounds half up (the rules
 * do not say which way a tie goes: common practice, no single source).
 */
export const US_ROUNDING_SOURCE = "21 CFR 101.9(c); FDA Food Labeling Guide, Appendix H";

function read(value: DecimalInput): Decimal | null {
  const r = readDecimal(value);
  return r.ok && !r.value.isNegative() ? r.value : null;
}

/** Strips a trailing ".0" so "4.0" reads "4" and "4.5" stays. */
const trim = (text: string) => text.replace(/\.0$/, "");

/** Calories: < 5 → 0; ≤ 50 → nearest 5; > 50 → nearest 10 (21 CFR 101.9(c)(1)). */
export function roundUsCalories(kcal: DecimalInput): Declared {
  const x = read(kcal);
  if (x === null) return { text: "—", value: null };
  const text = x.lt(5) ? "0" : x.lte(50) ? roundToStep(x, 5, 0) : roundToStep(x, 10, 0);
  return { text, value: text };
}

/** Total fat, saturated fat: < 0.5 g → 0; < 5 g → nearest 0.5 g; ≥ 5 g → nearest 1 g (101.9(c)(2)). */
export function roundUsFat(grams: DecimalInput): Declared {
  const x = read(grams);
  if (x === null) return { text: "—", value: null };
  const value = x.lt("0.5") ? "0" : x.lt(5) ? trim(roundToStep(x, "0.5", 1)) : roundToStep(x, 1, 0);
  return { text: `${value}g`, value };
}

/**
 * Total carbohydrate, fibre, sugars, added sugars, protein: < 0.5 g → 0; < 1 g → "less than
 * 1g"; ≥ 1 g → nearest 1 g (101.9(c)(6), (c)(7)).
 */
export function roundUsGrams(grams: DecimalInput): Declared {
  const x = read(grams);
  if (x === null) return { text: "—", value: null };
  if (x.lt("0.5")) return { text: "0g", value: "0" };
  if (x.lt(1)) return { text: "less than 1g", value: null };
  const value = roundToStep(x, 1, 0);
  return { text: `${value}g`, value };
}

/** Sodium: < 5 mg → 0; 5–140 mg → nearest 5 mg; > 140 mg → nearest 10 mg (101.9(c)(4)). */
export function roundUsSodium(mg: DecimalInput): Declared {
  const x = read(mg);
  if (x === null) return { text: "—", value: null };
  const value = x.lt(5) ? "0" : x.lte(140) ? roundToStep(x, 5, 0) : roundToStep(x, 10, 0);
  return { text: `${value}mg`, value };
}

/**
 * % Daily Value to the nearest whole percent (21 CFR 101.9(d)(7)(ii), from memory). It is worked
 * from the declared amount when that is a number, else from the actual amount (the rule allows
 * either; the declared one keeps "0g" beside "0 %").
 */
export function percentDailyValue(declared: Declared, actual: DecimalInput, dailyValue: DecimalInput): string {
  const amount = declared.value !== null ? new Dec(declared.value) : read(actual);
  if (amount === null) return "—";
  return `${amount.times(100).div(dailyValue).toDecimalPlaces(0, Dec.ROUND_HALF_UP).toFixed(0)}%`;
}
