import type { Decimal } from "decimal.js";
import { Dec, HUNDRED, ZERO, displayQuotient, toDecimalString } from "./decimal";
import type { RecipeSums } from "./composition";
import { STANDARD_QUANTITIES, type Quantity, type StandardQuantity } from "./quantities";
import type { Basis } from "./types";

/** The finished product's composition, percent by mass, as decimal strings. */
export type CompositionFigures = Record<Quantity, string> & {
  /** Whole percent for the EU "cocoa solids: X % minimum" line: EU-basis dry cocoa solids, rounded down. */
  cocoaSolidsStatement: string;
};

/** The standards' quantities as percentages of one basis, plus the basis's share of the product. */
export type BaseFigures = Record<StandardQuantity, string> & {
  /** The basis as a percentage of the finished product's mass (its dry matter for Codex). */
  baseMassPercent: string;
};

/** One basis's percentages, as shown (34 significant digits) and as strings. */
export interface BaseValues {
  readonly values: Readonly<Record<StandardQuantity, Decimal>>;
  readonly figures: BaseFigures;
}

const HUNDREDTH = new Dec("0.01");

/**
 * a / b rounded to the output precision, or 0 when b ≤ 0. Dividing by exactly 100 (the usual
 * total) is a decimal shift, done as an exact multiplication, which is much faster.
 */
function ratio(a: Decimal, b: Decimal): Decimal {
  if (b.eq(HUNDRED)) return a.times(HUNDREDTH);
  return b.gt(ZERO) ? displayQuotient(a, b) : ZERO;
}

/** Every standards quantity as a percentage of one basis (0 on a basis without mass). */
export function baseValues(sums: RecipeSums, basis: Basis): BaseValues {
  const mass = sums.baseMass[basis];
  const values = {} as Record<StandardQuantity, Decimal>;
  const figures = { baseMassPercent: toDecimalString(ratio(mass.times(HUNDRED), sums.total)) } as BaseFigures;
  for (const quantity of STANDARD_QUANTITIES) {
    const value = ratio(sums.quantities[quantity], mass);
    values[quantity] = value;
    figures[quantity] = toDecimalString(value);
  }
  return { values, figures };
}

/**
 * floor(a / b) computed exactly (b > 0): the quotient is rounded first, then corrected so that
 * q × b ≤ a < (q + 1) × b holds with exact products.
 */
export function floorDiv(a: Decimal, b: Decimal): Decimal {
  let q = a.div(b).floor();
  if (q.times(b).gt(a)) q = q.minus(1);
  else if (q.plus(1).times(b).lte(a)) q = q.plus(1);
  return q;
}

/**
 * The finished product's composition (= the US basis, which is the whole product) plus
 * inclusions and the EU cocoa-solids statement (Directive 2000/36/EC Art. 3, from memory:
 * the strict dry total on the EU basis, rounded down to a whole percent).
 */
export function compositionFigures(sums: RecipeSums, us: BaseFigures): CompositionFigures {
  const { baseMassPercent: _whole, ...quantities } = us;
  const euMass = sums.baseMass.eu;
  const statement = euMass.gt(ZERO) ? floorDiv(sums.quantities.totalDryCocoaSolids, euMass) : ZERO;
  return {
    ...quantities,
    inclusions: toDecimalString(ratio(sums.inclusions.times(HUNDRED), sums.total)),
    cocoaSolidsStatement: toDecimalString(Dec.max(statement, ZERO)),
  };
}
