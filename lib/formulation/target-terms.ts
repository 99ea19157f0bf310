import type { Decimal } from "decimal.js";
import { HUNDRED, ONE } from "./decimal";
import { sumRecipe, type RecipeSums } from "./composition";
import type { ParsedLine } from "./input";
import type { Quantity } from "./quantities";
import type { Basis } from "./types";

/** A basis for targets: the finished product (same as "us") or an authority's basis. */
export type SolveBasis = "product" | Basis;

/** Which side of a target an off-grid answer may land on. */
export type TargetDirection = "atLeast" | "atMost" | "nearest";

/**
 * A quantity and its basis mass as linear functions of x, the adjusted line's percent, when the
 * balancing line holds `shared − x`: amount(x) = amountAt0 + x × amountSlope, mass(x) likewise.
 * The quantity's percentage on the basis is amount(x) / mass(x). Units as in RecipeSums.
 */
export interface LinearTerms {
  readonly shared: Decimal;
  readonly amountAt0: Decimal;
  readonly amountSlope: Decimal;
  readonly massAt0: Decimal;
  readonly massSlope: Decimal;
  amountAt(x: Decimal): Decimal;
  massAt(x: Decimal): Decimal;
}

function amountOf(sums: RecipeSums, quantity: Quantity): Decimal {
  return quantity === "inclusions" ? sums.inclusions.times(HUNDRED) : sums.quantities[quantity];
}

function massOf(sums: RecipeSums, basis: SolveBasis): Decimal {
  return sums.baseMass[basis === "product" ? "us" : basis];
}

const withPercent = (line: ParsedLine, percent: Decimal): ParsedLine => ({ ...line, percent });

/** Builds the linear terms by summing the recipe with the two moving lines at 0 and at 1 %. */
export function linearTerms(
  lines: readonly ParsedLine[],
  adjustIndex: number,
  balanceIndex: number,
  quantity: Quantity,
  basis: SolveBasis,
): LinearTerms {
  const adjust = lines[adjustIndex]!;
  const balance = lines[balanceIndex]!;
  const shared = adjust.percent.plus(balance.percent);
  const rest = sumRecipe(lines.filter((line) => line.index !== adjustIndex && line.index !== balanceIndex));
  const unitA = sumRecipe([withPercent(adjust, ONE)]);
  const unitB = sumRecipe([withPercent(balance, ONE)]);
  const amountA = amountOf(unitA, quantity);
  const amountB = amountOf(unitB, quantity);
  const massA = massOf(unitA, basis);
  const massB = massOf(unitB, basis);
  const amountAt0 = amountOf(rest, quantity).plus(shared.times(amountB));
  const massAt0 = massOf(rest, basis).plus(shared.times(massB));
  const amountSlope = amountA.minus(amountB);
  const massSlope = massA.minus(massB);
  return {
    shared,
    amountAt0,
    amountSlope,
    massAt0,
    massSlope,
    amountAt: (x) => amountAt0.plus(x.times(amountSlope)),
    massAt: (x) => massAt0.plus(x.times(massSlope)),
  };
}

/** Exact test of the target at x: amount ≥ value × mass ("atLeast") or ≤ ("atMost"). */
export function meets(terms: LinearTerms, x: Decimal, value: Decimal, direction: "atLeast" | "atMost"): boolean {
  const amount = terms.amountAt(x);
  const bound = value.times(terms.massAt(x));
  return direction === "atLeast" ? amount.gte(bound) : amount.lte(bound);
}

