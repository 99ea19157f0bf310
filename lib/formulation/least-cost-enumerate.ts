import type { Decimal } from "decimal.js";
import { gridConstraintRows, gridCost, percentsAt, type Grid } from "./least-cost-grid";
import type { LeastCostModel } from "./least-cost-model";

/** Beyond this many fractional lines the 2^k roundings are left to the integer search. */
const MAX_FRACTIONAL = 12;

/** One way of rounding: whole steps per free line, its cost and its distance from the current mix. */
interface Candidate {
  readonly y: number[];
  readonly cost: number;
  readonly distance: number;
}

function choose(n: number, r: number, visit: (picked: readonly number[]) => void, start = 0, picked: number[] = []): void {
  if (picked.length === r) {
    visit(picked);
    return;
  }
  for (let i = start; i <= n - (r - picked.length); i++) {
    picked.push(i);
    choose(n, r, visit, i + 1, picked);
    picked.pop();
  }
}

/**
 * The quick rounding: every line the optimum leaves between two grid steps goes to its floor or
 * its ceiling, as many ceilings as keep the sum at 100 %, and the best of those roundings that
 * meets every constraint wins — the cheapest, or for "closest" the nearest to the current mix
 * among the cheapest (or under the user's ceiling). Rows come from gridConstraintRows, which
 * states them in whole numbers where it can, so the test on each candidate is exact; the caller
 * still re-checks the winner with decimals. Returns the passing roundings best first; none when
 * none passes or too many lines are fractional (the caller then runs the integer search).
 */
export function enumerateRoundings(model: LeastCostModel, grid: Grid, optimum: readonly number[]): Decimal[][] {
  const step = grid.step.toNumber();
  const steps = grid.free.map((line) => Math.max(0, ((optimum[line] ?? 0) - grid.fixed[line]!.toNumber()) / step));
  const base = steps.map((s) => (Math.abs(s - Math.round(s)) < 1e-7 ? Math.round(s) : Math.floor(s)));
  const fractional = steps.flatMap((s, k) => (Math.abs(s - Math.round(s)) < 1e-7 ? [] : [k]));
  const ceilings = grid.steps - base.reduce((a, b) => a + b, 0);
  if (fractional.length > MAX_FRACTIONAL || ceilings < 0 || ceilings > fractional.length) return [];
  const rows = gridConstraintRows(model, grid);
  const activity = rows.map((row) => row.coefficients.reduce((sum, c, k) => sum + c * base[k]!, 0));
  const perStep = gridCost(model, grid).perStep.map((c) => c.toNumber());
  const current = grid.free.map((line) => model.lines[line]!.current.toNumber() - grid.fixed[line]!.toNumber());
  const passing: Candidate[] = [];
  choose(fractional.length, ceilings, (picked) => {
    const up = picked.map((p) => fractional[p]!);
    const ok = rows.every((row, r) => {
      const value = up.reduce((sum, k) => sum + row.coefficients[k]!, activity[r]!);
      return value >= row.lower - 1e-9 && value <= row.upper + 1e-9;
    });
    if (!ok) return;
    const y = base.slice();
    for (const k of up) y[k] = y[k]! + 1;
    const cost = y.reduce((sum, v, k) => sum + v * perStep[k]!, 0);
    const distance = y.reduce((sum, v, k) => sum + Math.abs(v * step - current[k]!), 0);
    passing.push({ y, cost, distance });
  });
  return rank(model, passing).map((c) => percentsAt(grid, c.y));
}

/** Best first: by cost then distance, or for "closest" by distance among those within the ceiling. */
function rank(model: LeastCostModel, candidates: Candidate[]): Candidate[] {
  if (model.objective.kind !== "closest") return candidates.sort((a, b) => a.cost - b.cost || a.distance - b.distance);
  const cap = model.objective.cap;
  const cheapest = Math.min(...candidates.map((c) => c.cost));
  const ceiling = cap === undefined ? cheapest + 1e-9 * Math.max(1, cheapest) : Infinity;
  return candidates.filter((c) => c.cost <= ceiling).sort((a, b) => a.distance - b.distance || a.cost - b.cost);
}
