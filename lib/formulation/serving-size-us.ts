import type { Decimal } from "decimal.js";
import { Dec, ONE, ZERO, describeInput, readDecimal, toDecimalString } from "./decimal";
import { US_RACC_CHOCOLATE_BAR } from "./reference/nutrition-factors";
import type { DecimalInput } from "./types";

/**
 * The US serving size of a bar from the reference amount (RACC, 21 CFR 101.12(b): 30 g for
 * chocolate bars) and the rules of 21 CFR 101.9(b) (2016 rule; clause letters from memory —
 * verify): a package under 200 % of the RACC is one serving; 200–300 % needs a second column
 * for the whole package; otherwise the serving is the number of whole pieces, or the fraction
 * of the bar, closest to the RACC.
 */

export interface UsServingInput {
  /** Net mass of the bar (the package), grams. */
  packageGrams: DecimalInput;
  /** Equal pieces the bar breaks into, when moulded in pieces. */
  piecesPerPackage?: number | null;
  /** RACC in grams; 30 (chocolate bars) when omitted. */
  referenceAmountGrams?: DecimalInput;
}

export type UsServingKind = "single-serving" | "dual-column" | "multiple-servings";

export type UsServing =
  | {
      ok: true;
      kind: UsServingKind;
      /** Declared serving, whole grams. Nutrients per serving are computed on this mass. */
      servingGrams: string;
      /** "1 bar", "1/2 bar", "5 pieces". */
      householdMeasure: string;
      /** Servings per container as declared: "1", "2", "about 2.5". */
      servingsPerContainer: string;
      packageGrams: string;
      /** The clauses applied, for the page's notes. */
      clauses: string[];
    }
  | { ok: false; reason: string };

const HALF = new Dec("0.5");
const TWO = new Dec(2);
const THREE = new Dec(3);

/**
 * Fractions a bar usually divided for eating may be declared in: 1/2 … 1/6, and smaller ones
 * made by further halving or thirding (21 CFR 101.9(b)(2)(ii), from memory).
 */
const FRACTIONS: readonly number[] = (() => {
  const set = new Set([2, 3, 4, 5, 6]);
  for (let grown = true; grown; ) {
    grown = false;
    for (const n of [...set]) for (const m of [n * 2, n * 3]) if (m <= 96 && !set.has(m)) { set.add(m); grown = true; }
  }
  return [...set].sort((a, b) => a - b);
})();

/** The candidate whose mass is closest to target; on a tie the earlier (smaller) one. */
function closest<T>(candidates: readonly T[], mass: (c: T) => Decimal, target: Decimal): T {
  let best = candidates[0] as T;
  for (const c of candidates) if (mass(c).minus(target).abs().lt(mass(best).minus(target).abs())) best = c;
  return best;
}

/**
 * Servings per container as declared, 21 CFR 101.9(b)(8)(i) (from memory): to the nearest whole
 * number, except between 2 and 5 servings to the nearest 0.5; "about" when rounding changed it.
 */
export function declareServingsPerContainer(exact: DecimalInput): string {
  const read = readDecimal(exact);
  if (!read.ok || !read.value.gt(ZERO)) return "—";
  const x = read.value;
  const declared = x.gte(TWO) && x.lte(5) ? x.div(HALF).toDecimalPlaces(0, Dec.ROUND_HALF_UP).times(HALF) : Dec.max(ONE, x.toDecimalPlaces(0, Dec.ROUND_HALF_UP));
  return declared.eq(x) ? toDecimalString(x) : `about ${toDecimalString(declared)}`;
}

/** The US serving of a bar; `{ ok: false }` for a mass or piece count that is not usable. */
export function usServingSize(input: UsServingInput): UsServing {
  const pkg = readDecimal(input.packageGrams);
  if (!pkg.ok || !pkg.value.gt(ZERO)) return { ok: false, reason: `The bar mass ${describeInput(input.packageGrams)} must be a number above 0 g.` };
  const racc = readDecimal(input.referenceAmountGrams ?? US_RACC_CHOCOLATE_BAR.value);
  if (!racc.ok || !racc.value.gt(ZERO)) return { ok: false, reason: `The reference amount ${describeInput(input.referenceAmountGrams)} must be a number above 0 g.` };
  const pieces = input.piecesPerPackage ?? null;
  if (pieces !== null && (!Number.isInteger(pieces) || pieces < 1 || pieces > 500)) return { ok: false, reason: `The number of pieces ${describeInput(pieces)} must be a whole number from 1 to 500.` };
  const W = pkg.value;
  const R = racc.value;
  const packageGrams = toDecimalString(W);
  const wholeGrams = (g: Decimal) => g.toDecimalPlaces(0, Dec.ROUND_HALF_UP).toFixed(0);
  const clauses = [`${US_RACC_CHOCOLATE_BAR.clause}: reference amount ${toDecimalString(R)} g`];

  if (W.lt(R.times(TWO))) {
    clauses.push("21 CFR 101.9(b)(6): under 200 % of the reference amount, the package is one serving");
    return { ok: true, kind: "single-serving", servingGrams: wholeGrams(W), householdMeasure: "1 bar", servingsPerContainer: "1", packageGrams, clauses };
  }
  const kind: UsServingKind = W.lte(R.times(THREE)) ? "dual-column" : "multiple-servings";
  if (kind === "dual-column") clauses.push("21 CFR 101.9(b)(12)(i): 200–300 % of the reference amount, a second column for the whole package");

  let serving: Decimal;
  let householdMeasure: string;
  let servings: Decimal;
  if (pieces !== null && pieces > 1) {
    const piece = W.div(pieces);
    let count: number;
    if (piece.lte(R.times(HALF))) {
      const counts = Array.from({ length: pieces }, (_, i) => i + 1);
      count = closest(counts, (k) => piece.times(k), R);
      clauses.push("21 CFR 101.9(b)(2)(i)(A): pieces of 50 % of the reference amount or less, the whole number of pieces closest to it");
    } else {
      count = 1;
      clauses.push("21 CFR 101.9(b)(2)(i)(B)–(D): a piece over 50 % of the reference amount, one piece");
    }
    serving = piece.times(count);
    householdMeasure = count === 1 ? "1 piece" : `${count} pieces`;
    servings = new Dec(pieces).div(count);
  } else {
    const n = closest(FRACTIONS, (k) => W.div(k), R);
    serving = W.div(n);
    householdMeasure = `1/${n} bar`;
    servings = new Dec(n);
    clauses.push("21 CFR 101.9(b)(2)(ii): a bar divided for eating, the fraction closest to the reference amount");
  }
  clauses.push("21 CFR 101.9(b)(8)(i): servings per container to the nearest whole number, 0.5 between 2 and 5");
  return { ok: true, kind, servingGrams: wholeGrams(serving), householdMeasure, servingsPerContainer: declareServingsPerContainer(toDecimalString(servings)), packageGrams, clauses };
}
