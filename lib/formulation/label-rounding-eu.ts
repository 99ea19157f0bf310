import type { Decimal } from "decimal.js";
import { Dec, readDecimal } from "./decimal";
import type { NutritionAmounts } from "./nutrition";
import { EU_REFERENCE_INTAKES } from "./reference/nutrition-factors";
import type { DecimalInput } from "./types";

/**
 * Rounding for the EU nutrition declaration, after the European Commission's guidance document
 * on tolerances and rounding (December 2012), section 4 (REFERENCE.md §4: the increments are
 * from memory). "Nearest" rounds half up. The band is chosen on the unrounded amount, so 9.96 g
 * of fat is in the 0.1 g band and reads "10.0 g".
 */
export const EU_ROUNDING_SOURCE = "EC guidance on tolerances and rounding, December 2012, section 4 (from memory — verify)";

/** A declared figure: the text for the label and, when it is a number, that number. */
export interface Declared {
  text: string;
  value: string | null;
}

/** Which rounding rule a mass nutrient follows. */
export type EuMassRule = "macronutrient" | "saturates" | "salt";

/** Band edges: at or above `whole` → `wholeStep`; above `small` → `fineStep`; else "< small". */
const BANDS: Record<EuMassRule, { whole: string; wholeStep: string; small: string; fineStep: string; places: number }> = {
  // Fat, carbohydrate, sugars, protein, fibre: ≥ 10 g → 1 g; > 0.5 to < 10 g → 0.1 g; ≤ 0.5 g → "< 0.5 g".
  macronutrient: { whole: "10", wholeStep: "1", small: "0.5", fineStep: "0.1", places: 1 },
  // Saturates: ≥ 10 g → 1 g; > 0.1 to < 10 g → 0.1 g; ≤ 0.1 g → "< 0.1 g".
  saturates: { whole: "10", wholeStep: "1", small: "0.1", fineStep: "0.1", places: 1 },
  // Salt: ≥ 1 g → 0.1 g; > 0.0125 to < 1 g → 0.01 g; ≤ 0.0125 g → "< 0.01 g".
  salt: { whole: "1", wholeStep: "0.1", small: "0.0125", fineStep: "0.01", places: 2 },
};

/** value rounded half up to a multiple of step, with `places` decimals. */
export function roundToStep(value: Decimal, step: DecimalInput, places: number): string {
  return value.div(step).toDecimalPlaces(0, Dec.ROUND_HALF_UP).times(step).toFixed(places);
}

function readAmount(value: DecimalInput): Decimal | null {
  const read = readDecimal(value);
  return read.ok && !read.value.isNegative() ? read.value : null;
}

/** Rounds a mass in grams for the EU declaration (see BANDS); "—" when not a number. */
export function roundEuMass(grams: DecimalInput, rule: EuMassRule): Declared {
  const x = readAmount(grams);
  if (x === null) return { text: "—", value: null };
  if (x.isZero()) return { text: "0 g", value: "0" };
  const b = BANDS[rule];
  if (x.gte(b.whole)) {
    const text = roundToStep(x, b.wholeStep, rule === "salt" ? 1 : 0);
    return { text: `${text} g`, value: text };
  }
  if (x.gt(b.small)) {
    const text = roundToStep(x, b.fineStep, b.places);
    return { text: `${text} g`, value: text };
  }
  // The guidance allows "0 g" or "< X g" here; we say "<" so a trace is not read as none.
  return { text: `< ${rule === "salt" ? "0.01" : b.small} g`, value: null };
}

/** Energy to the nearest whole kJ or kcal (guidance section 4, energy row). */
export function roundEuEnergy(value: DecimalInput, unit: "kJ" | "kcal"): Declared {
  const x = readAmount(value);
  if (x === null) return { text: "—", value: null };
  const text = x.toDecimalPlaces(0, Dec.ROUND_HALF_UP).toFixed(0);
  return { text: `${text} ${unit}`, value: text };
}

/** One row of the EU table, in the order of Regulation (EU) No 1169/2011 Annex XV. */
export interface EuDeclarationRow {
  key: "energy" | "fat" | "saturates" | "carbohydrate" | "sugars" | "fibre" | "protein" | "salt";
  label: string;
  /** "of which" rows are shown indented. */
  sub: boolean;
  per100g: string;
  perPortion?: string;
  /** % of the reference intake per portion, whole percent (Annex XIII Part B). */
  referenceIntakePercent?: string;
}

const RI = EU_REFERENCE_INTAKES;

function riPercent(amount: string, intake: string): string {
  return new Dec(amount).times(100).div(intake).toDecimalPlaces(0, Dec.ROUND_HALF_UP).toFixed(0);
}

/**
 * The EU nutrition declaration: energy, fat, saturates, carbohydrate, sugars, fibre, protein,
 * salt (Regulation (EU) No 1169/2011 Art. 30(1) with fibre from Art. 30(2)(f), in Annex XV
 * order), per 100 g and, when given, per portion with % of the reference intakes. Fibre has
 * no reference intake. Percentages use the unrounded amounts.
 */
export function euNutritionDeclaration(per100g: NutritionAmounts, portion?: NutritionAmounts): EuDeclarationRow[] {
  const energy = (a: NutritionAmounts) => `${roundEuEnergy(a.energyKj, "kJ").text} / ${roundEuEnergy(a.energyKcal, "kcal").text}`;
  const rows: Array<[EuDeclarationRow["key"], string, boolean, (a: NutritionAmounts) => string, string | null, keyof NutritionAmounts | null]> = [
    ["energy", "Energy", false, energy, RI.energyKj, "energyKj"],
    ["fat", "Fat", false, (a) => roundEuMass(a.fat, "macronutrient").text, RI.fat, "fat"],
    ["saturates", "of which saturates", true, (a) => roundEuMass(a.saturates, "saturates").text, RI.saturates, "saturates"],
    ["carbohydrate", "Carbohydrate", false, (a) => roundEuMass(a.carbohydrateAvailable, "macronutrient").text, RI.carbohydrate, "carbohydrateAvailable"],
    ["sugars", "of which sugars", true, (a) => roundEuMass(a.sugars, "macronutrient").text, RI.sugars, "sugars"],
    ["fibre", "Fibre", false, (a) => roundEuMass(a.fibre, "macronutrient").text, null, null],
    ["protein", "Protein", false, (a) => roundEuMass(a.protein, "macronutrient").text, RI.protein, "protein"],
    ["salt", "Salt", false, (a) => roundEuMass(a.salt, "salt").text, RI.salt, "salt"],
  ];
  return rows.map(([key, label, sub, show, intake, field]) => {
    const row: EuDeclarationRow = { key, label, sub, per100g: show(per100g) };
    if (portion) {
      row.perPortion = show(portion);
      if (intake !== null && field !== null) row.referenceIntakePercent = riPercent(portion[field], intake);
    }
    return row;
  });
}

