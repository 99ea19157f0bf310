import type { NumericLp } from "./least-cost-highs";
import type { Grid } from "./least-cost-grid";
import { gridCost } from "./least-cost-grid";
import type { LeastCostModel } from "./least-cost-model";

/** Beyond this many grid points a box is left to the integer search. */
const MAX_POINTS = 50_000;

type Row = NumericLp["rows"][number];

/** One way of rounding: whole steps per free line, its cost and its distance from the current mix. */
interface Candidate {
  readonly y: number[];
  readonly cost: number;
  readonly distance: number;
}

/** Each free line's optimum in whole steps (fractions kept). */
function optimumSteps(grid: Grid, optimum: readonly number[]): number[] {
  const step = grid.step.toNumber();
  return grid.free.map((line) => Math.max(0, ((optimum[line] ?? 0) - grid.fixed[line]!.toNumber()) / step));
}

const isWhole = (s: number) => Math.abs(s - Math.round(s)) < 1e-7;

/**
 * Every grid point y with lower ≤ y ≤ upper (per free line) and Σ y = grid.steps that meets all
 * `rows` (whole-number rows from gridConstraintRows, so the test is exact where they are whole),
 * walked depth first with the running row activities; none when the box holds more than
 * MAX_POINTS points. Σ y prunes the walk: the last line takes what is left.
 */
function walkBox(model: LeastCostModel, grid: Grid, rows: readonly Row[], lower: readonly number[], upper: readonly number[]): Candidate[] {
  const m = grid.free.length;
  let points = 1;
  for (let k = 0; k < m; k++) points *= upper[k]! - lower[k]! + 1;
  if (m === 0 || points > MAX_POINTS) return [];
  // Fewest and most steps the lines after k can take, for the Σ y pruning.
  const restMin = new Array<number>(m + 1).fill(0);
  const restMax = new Array<number>(m + 1).fill(0);
  for (let k = m - 1; k >= 0; k--) {
    restMin[k] = restMin[k + 1]! + lower[k]!;
    restMax[k] = restMax[k + 1]! + upper[k]!;
  }
  const perStep = gridCost(model, grid).perStep.map((c) => c.toNumber());
  const step = grid.step.toNumber();
  const current = grid.free.map((line) => model.lines[line]!.current.toNumber() - grid.fixed[line]!.toNumber());
  const activity = new Array<number>(rows.length).fill(0);
  const y = new Array<number>(m).fill(0);
  const passing: Candidate[] = [];
  const visit = (k: number, left: number): void => {
    const from = Math.max(lower[k]!, left - restMax[k + 1]!);
    const to = Math.min(upper[k]!, left - restMin[k + 1]!);
    for (let v = from; v <= to; v++) {
      y[k] = v;
      rows.forEach((row, r) => (activity[r] = activity[r]! + row.coefficients[k]! * v));
      if (k + 1 < m) visit(k + 1, left - v);
      else if (rows.every((row, r) => activity[r]! >= row.lower - 1e-9 && activity[r]! <= row.upper + 1e-9)) {
        const cost = y.reduce((sum, s, i) => sum + s * perStep[i]!, 0);
        const distance = y.reduce((sum, s, i) => sum + Math.abs(s * step - current[i]!), 0);
        passing.push({ y: y.slice(), cost, distance });
      }
      rows.forEach((row, r) => (activity[r] = activity[r]! - row.coefficients[k]! * v));
    }
  };
  visit(0, grid.steps);
  return passing;
}

/**
 * The quick rounding: every line the optimum leaves between two grid steps goes to its floor or
 * its ceiling (as many ceilings as keep the sum at 100 %), whole lines stay. Returns the grid
 * points (steps per free line) that meet every row, best first — the cheapest, or for "closest"
 * the nearest to the current mix among the cheapest (or under the user's ceiling). The caller
 * re-checks the winner with decimals.
 */
export function enumerateRoundings(model: LeastCostModel, grid: Grid, optimum: readonly number[], rows: readonly Row[]): number[][] {
  const steps = optimumSteps(grid, optimum);
  const lower = steps.map((s) => (isWhole(s) ? Math.round(s) : Math.floor(s)));
  const upper = steps.map((s) => (isWhole(s) ? Math.round(s) : Math.floor(s) + 1));
  return rank(model, walkBox(model, grid, rows, lower, upper)).map((c) => c.y);
}

/**
 * The wider rounding, for when no floor-or-ceiling rounding passes: every line the optimum uses
 * may take any step from its floor − 1 to its ceiling + 1; lines it leaves empty stay empty.
 * Cheap next to the integer search (a few thousand points for a 20-line milk recipe), which the
 * caller still runs when this finds nothing.
 */
export function enumerateWindow(model: LeastCostModel, grid: Grid, optimum: readonly number[], rows: readonly Row[]): number[][] {
  const steps = optimumSteps(grid, optimum);
  const used = steps.map((s) => s > 1e-7);
  const lower = steps.map((s, k) => (used[k] ? Math.max(0, Math.floor(s + 1e-9) - 1) : 0));
  const upper = steps.map((s, k) => (used[k] ? Math.min(grid.steps, Math.ceil(s - 1e-9) + 1) : 0));
  return rank(model, walkBox(model, grid, rows, lower, upper)).map((c) => c.y);
}

/** Best first: by cost then distance, or for "closest" by distance among those within the ceiling. */
function rank(model: LeastCostModel, candidates: Candidate[]): Candidate[] {
  if (model.objective.kind !== "closest") return candidates.sort((a, b) => a.cost - b.cost || a.distance - b.distance);
  const cap = model.objective.cap;
  const cheapest = Math.min(...candidates.map((c) => c.cost));
  const ceiling = cap === undefined ? cheapest + 1e-9 * Math.max(1, cheapest) : Infinity;
  return candidates.filter((c) => c.cost <= ceiling).sort((a, b) => a.distance - b.distance || a.cost - b.cost);
}
