import type { Decimal } from "decimal.js";
import { ZERO, describeInput, readDecimal, toDecimalString } from "./decimal";
import { parseRecipeLines } from "./input";
import { QUANTITY_LABELS, isQuantity, type Quantity } from "./quantities";
import { readPercentResolution } from "./resolution";
import type { RebalancedLine } from "./rebalance";
import { linearTerms, meets, type SolveBasis, type TargetDirection } from "./target-terms";
import type { DecimalInput, RecipeLine } from "./types";

/** What to hit: a composition quantity at a value (percent) on a basis (default "product"). */
export interface TargetSpec {
  quantity: Quantity;
  value: DecimalInput;
  basis?: SolveBasis;
}

/** Options of solveForTarget. */
export interface SolveOptions {
  /** Grid step in percent for the moved lines; default 0.1, must divide 100. */
  resolution?: DecimalInput;
  /** Lines that must not move. */
  locked?: readonly boolean[];
  /** Which side of the target an off-grid answer may land on; see defaultDirection. */
  direction?: TargetDirection;
}

/** The outcome: new lines and the value reached, or a sentence saying why not. */
export type SolveResult<T> =
  | { ok: true; lines: RebalancedLine<T>[]; achieved: string; exact: boolean; exactPercent: string }
  | { ok: false; reason: string };

const MAXIMUM_LIKE: ReadonlySet<Quantity> = new Set<Quantity>(["sugar", "vegetableFat", "moisture"]);

/**
 * The side an off-grid answer rounds to when none is given: quantities the standards set
 * minimums for round so the target is still met ("atLeast"); sugar, vegetable fat and moisture,
 * which only have maximums, round so it is not exceeded ("atMost"); inclusions and other to the
 * nearest step.
 */
export function defaultDirection(quantity: Quantity): TargetDirection {
  if (MAXIMUM_LIKE.has(quantity)) return "atMost";
  return quantity === "inclusions" || quantity === "other" ? "nearest" : "atLeast";
}

function fail<T>(reason: string): SolveResult<T> {
  return { ok: false, reason };
}

/**
 * Moves line `adjustIndex` against line `balanceIndex` (their sum stays fixed, every other line
 * stays put) so that `target.quantity` on `target.basis` equals `target.value`. The quantity is
 * a ratio of two linear functions of the adjusted percent, so the equation is solved exactly
 * with decimals. If the answer is not on the resolution grid, it moves to the neighbouring grid
 * step on the side `direction` allows and reports `exact: false` with the `achieved` value.
 * Returns `{ ok: false, reason }` (a sentence) for bad input, locked lines, no effect, a
 * negative line or no admissible step. Never throws.
 */
export function solveForTarget<T extends RecipeLine>(
  lines: readonly T[],
  target: TargetSpec,
  adjustIndex: number,
  balanceIndex: number,
  options: SolveOptions = {},
): SolveResult<T> {
  const parsed = parseRecipeLines({ lines }, []);
  const valid = (i: number) => Number.isInteger(i) && i >= 0 && i < parsed.length;
  if (!valid(adjustIndex) || !valid(balanceIndex)) return fail(`Lines ${describeInput(adjustIndex)} and ${describeInput(balanceIndex)} must both be lines of the recipe.`);
  if (adjustIndex === balanceIndex) return fail("The line to adjust and the balancing line must be different lines.");
  const adjust = parsed[adjustIndex]!;
  const balance = parsed[balanceIndex]!;
  for (const line of [adjust, balance]) if (options?.locked?.[line.index] === true) return fail(`${line.label} is locked.`);
  const quantity = target?.quantity;
  if (!isQuantity(quantity)) return fail(`${describeInput(quantity)} is not a composition quantity.`);
  const basis = target.basis ?? "product";
  if (!["product", "eu", "codex", "us"].includes(basis)) return fail(`${describeInput(basis)} is not a basis (product, eu, codex or us).`);
  const read = readDecimal(target.value);
  if (!read.ok) return fail(`The target ${describeInput(target.value)} is not a number.`);
  const value = read.value;
  const notes: string[] = [];
  const step = readPercentResolution(options?.resolution, notes);
  if (notes.length > 0) return fail(notes.join(" "));
  const terms = linearTerms(parsed, adjustIndex, balanceIndex, quantity, basis);
  const name = QUANTITY_LABELS[quantity];
  const goal = `${name} at ${toDecimalString(value)} %`;
  // amount(x) = value × mass(x)  ⇔  x × slope = rest (both sides exact decimals).
  const slope = terms.amountSlope.minus(value.times(terms.massSlope));
  const rest = value.times(terms.massAt0).minus(terms.amountAt0);
  if (slope.isZero()) {
    if (!rest.isZero()) return fail(`Moving ${adjust.label} against ${balance.label} does not change the ${name} figure; pick other lines.`);
  }
  const exactX = slope.isZero() ? adjust.percent : rest.div(slope);
  const shared = terms.shared;
  if (exactX.lt(ZERO)) return fail(`Reaching ${goal} would need ${adjust.label} at ${toDecimalString(exactX)} %, below 0.`);
  if (exactX.gt(shared)) return fail(`Reaching ${goal} would need ${balance.label} at ${toDecimalString(shared.minus(exactX))} %, below 0: ${adjust.label} cannot go above ${toDecimalString(shared)} %.`);
  const direction = options?.direction ?? defaultDirection(quantity);
  const floor = exactX.div(step).floor().times(step);
  const candidates = floor.eq(exactX) ? [floor] : [floor, floor.plus(step)];
  const admissible = candidates
    .filter((x) => x.gte(ZERO) && x.lte(shared) && terms.massAt(x).gt(ZERO))
    .filter((x) => direction === "nearest" || meets(terms, x, value, direction))
    .sort((a, b) => a.minus(exactX).abs().cmp(b.minus(exactX).abs()));
  const chosen = admissible[0];
  if (chosen === undefined) return fail(`No step of ${toDecimalString(step)} % for ${adjust.label} reaches ${goal} within 0–${toDecimalString(shared)} %; the exact answer is ${toDecimalString(exactX)} %.`);
  const percentOf = (line: (typeof parsed)[number]): Decimal =>
    line.index === adjustIndex ? chosen : line.index === balanceIndex ? shared.minus(chosen) : line.percent;
  return {
    ok: true,
    lines: lines.map((line, i) => ({ ...line, percent: toDecimalString(percentOf(parsed[i]!)) })),
    achieved: toDecimalString(terms.amountAt(chosen).div(terms.massAt(chosen))),
    exact: chosen.times(slope).eq(rest),
    exactPercent: toDecimalString(exactX),
  };
}
