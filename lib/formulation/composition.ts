import type { Decimal } from "decimal.js";
import { Dec, HUNDRED, ZERO } from "./decimal";
import type { ParsedLine } from "./input";
import type { StandardQuantity } from "./quantities";
import type { Basis } from "./types";

/** 21 CFR 163.123(a)(2): chocolate liquor = 2.2 × (cocoa ingredient − its cacao fat). */
export const US_CHOCOLATE_LIQUOR_FACTOR: Decimal = new Dec("2.2");

/**
 * The recipe reduced to exact sums, in "percent × g per 100 g" units, so that a quantity's
 * percentage on a basis is `quantities[q] / baseMass[basis]` and a minimum m is met exactly
 * when `quantities[q] ≥ m × baseMass[basis]` (no division, no rounding).
 */
export interface RecipeSums {
  /** Σ percent of all lines: the finished product, in recipe parts. */
  readonly total: Decimal;
  /** Σ percent of inclusion lines, in recipe parts. */
  readonly inclusions: Decimal;
  /** Mass of each basis in recipe parts (eu: total − inclusions; codex: its dry matter; us: total). */
  readonly baseMass: Readonly<Record<Basis, Decimal>>;
  /** Σ percent × g per 100 g over non-inclusion lines, per quantity. */
  readonly quantities: Readonly<Record<StandardQuantity, Decimal>>;
}

function accumulate(sum: Decimal, percent: Decimal, perHundred: Decimal): Decimal {
  return perHundred.isZero() ? sum : sum.plus(percent.times(perHundred));
}

/**
 * Sums a validated recipe. Inclusion lines add to `total` and `inclusions` only.
 * Codex dry matter = Σ over non-inclusion lines of percent × (100 − moisture) / 100.
 * A line's US chocolate-liquor contribution (cocoa lines only, 21 CFR 163.123(a)(2)) is
 * 2.2 × percent × (100 − cocoaButter): its own moisture stays in, added cocoa butter (no
 * non-fat cocoa solids) adds nothing.
 */
export function sumRecipe(lines: readonly ParsedLine[]): RecipeSums {
  let total = ZERO;
  let inclusions = ZERO;
  let moisture = ZERO;
  let cocoaButter = ZERO;
  let cocoaSolidsNonFat = ZERO;
  let milkFat = ZERO;
  let milkSolidsNonFat = ZERO;
  let sugar = ZERO;
  let vegetableFat = ZERO;
  let other = ZERO;
  let liquorBase = ZERO;
  for (const line of lines) {
    const p = line.percent;
    if (p.isZero()) continue;
    total = total.plus(p);
    if (line.inclusion) {
      inclusions = inclusions.plus(p);
      continue;
    }
    const f = line.fields;
    cocoaButter = accumulate(cocoaButter, p, f.cocoaButter);
    cocoaSolidsNonFat = accumulate(cocoaSolidsNonFat, p, f.cocoaSolidsNonFat);
    milkFat = accumulate(milkFat, p, f.milkFat);
    milkSolidsNonFat = accumulate(milkSolidsNonFat, p, f.milkSolidsNonFat);
    sugar = accumulate(sugar, p, f.sugar);
    vegetableFat = accumulate(vegetableFat, p, f.vegetableFat);
    moisture = accumulate(moisture, p, f.moisture);
    other = accumulate(other, p, line.other);
    if (line.isCocoa) liquorBase = liquorBase.plus(p.times(HUNDRED.minus(f.cocoaButter)));
  }
  const euBase = total.minus(inclusions);
  return {
    total,
    inclusions,
    baseMass: { eu: euBase, codex: euBase.minus(moisture.div(HUNDRED)), us: total },
    quantities: {
      totalDryCocoaSolids: cocoaButter.plus(cocoaSolidsNonFat),
      cocoaButter,
      cocoaSolidsNonFat,
      dryMilkSolids: milkFat.plus(milkSolidsNonFat),
      milkFat,
      milkSolidsNonFat,
      totalFat: cocoaButter.plus(milkFat),
      sugar,
      vegetableFat,
      moisture,
      other,
      usChocolateLiquor: liquorBase.times(US_CHOCOLATE_LIQUOR_FACTOR),
    },
  };
}
