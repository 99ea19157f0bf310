import type { Decimal } from "decimal.js";
import { HUNDRED, ZERO } from "./decimal";
import type { NumericLp } from "./least-cost-highs";
import { rowOf, type LeastCostModel, type ModelConstraint } from "./least-cost-model";

/**
 * A "less than" maximum cannot be reached in a continuous programme; the row stops this far
 * short (row units are percent × g per 100 g, so 1e-6 is 1e-8 percentage points at 100 % mass).
 * The bench grid and the exact re-check decide the real outcome.
 */
const STRICT_MARGIN = 1e-6;

/** The continuous row of one constraint (see ModelConstraint). */
export function continuousRow(constraint: ModelConstraint): NumericLp["rows"][number] {
  const coefficients = rowOf(constraint).map((c) => c.toNumber());
  if (constraint.sense === "equal") return { coefficients, lower: 0, upper: 0 };
  if (constraint.sense === "min") return { coefficients, lower: 0, upper: Infinity };
  return { coefficients, lower: -Infinity, upper: constraint.strict ? -STRICT_MARGIN : 0 };
}

/** Σ x = 100: the lines make the whole recipe. Never relaxed. */
function sumRow(n: number, width: number): NumericLp["rows"][number] {
  return { coefficients: Array.from({ length: width }, (_, j) => (j < n ? 1 : 0)), lower: 100, upper: 100 };
}

/** Ingredient cost per kg of chocolate per percent of each line: price per kg / 100. */
export function costPerPercent(model: LeastCostModel): number[] {
  return model.lines.map((line) => (line.parsed.pricePerKg ?? ZERO).div(HUNDRED).toNumber());
}

export type LpGoal = { kind: "cost" } | { kind: "feasibility" } | { kind: "closest"; costCeiling?: number };

/**
 * The continuous programme over the line percents x (0–100) with the given constraints.
 * - "cost": minimise Σ price × x / 100 (cost per kg).
 * - "feasibility": no objective (used to test a set of constraints).
 * - "closest": minimise Σ |x − current| with one auxiliary d_i ≥ |x_i − current_i| per line,
 *   and, when given, cost per kg ≤ costCeiling.
 */
export function buildLp(model: LeastCostModel, constraints: readonly ModelConstraint[], goal: LpGoal): NumericLp {
  const n = model.lines.length;
  const closest = goal.kind === "closest";
  const width = closest ? 2 * n : n;
  const pad = (row: readonly number[]) => (closest ? [...row, ...new Array<number>(n).fill(0)] : [...row]);
  const rows: NumericLp["rows"][number][] = [sumRow(n, width)];
  for (const constraint of constraints) {
    const row = continuousRow(constraint);
    rows.push({ ...row, coefficients: pad(row.coefficients) });
  }
  const prices = costPerPercent(model);
  let cost: number[] = goal.kind === "cost" ? prices : new Array<number>(n).fill(0);
  if (closest) {
    cost = [...new Array<number>(n).fill(0), ...new Array<number>(n).fill(1)];
    model.lines.forEach((line, i) => {
      const c = line.current.toNumber();
      const plus = new Array<number>(width).fill(0);
      plus[i] = -1;
      plus[n + i] = 1;
      rows.push({ coefficients: plus, lower: -c, upper: Infinity }); // d_i − x_i ≥ −c_i
      const minus = new Array<number>(width).fill(0);
      minus[i] = 1;
      minus[n + i] = 1;
      rows.push({ coefficients: minus, lower: c, upper: Infinity }); // d_i + x_i ≥ c_i
    });
    if (goal.costCeiling !== undefined) rows.push({ coefficients: pad(prices), lower: -Infinity, upper: goal.costCeiling });
  }
  return {
    cost,
    colLower: new Array<number>(width).fill(0),
    colUpper: [...new Array<number>(n).fill(100), ...new Array<number>(width - n).fill(Infinity)],
    rows,
  };
}

/**
 * True when the constraint is at its bound in the solver's (float) optimum, within the solver's
 * own tolerance scaled to the row: relaxing it could let the cost fall. Targets always bind.
 */
export function isBinding(constraint: ModelConstraint, x: readonly number[]): boolean {
  // A lock is the user's own choice, and a row of zeros (e.g. "no vegetable fat" when no line
  // has any) sits at its bound whatever the mix: neither says anything about the cost.
  if (constraint.kind === "lock") return false;
  const row = rowOf(constraint);
  if (row.every((c) => c.isZero())) return false;
  if (constraint.sense === "equal") return true;
  let activity = 0;
  let scale = 1;
  row.forEach((c: Decimal, i) => {
    const term = c.toNumber() * (x[i] ?? 0);
    activity += term;
    scale += Math.abs(term);
  });
  return Math.abs(activity) <= 1e-7 * scale;
}
