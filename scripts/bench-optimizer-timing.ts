/**
 * Timing of the least-cost solver, shared by Node and the browser (no Node APIs here): the
 * median of `rounds` full solves (model, LP, rounding, exact re-check, evaluateRecipe) after a
 * warm-up, in milliseconds.
 */
import { solveLeastCost, type LeastCostProblem, type LpSolver } from "../lib/formulation";

export function medianSolveMs(solver: LpSolver, problem: LeastCostProblem, rounds = 41): { median: number; ok: boolean } {
  let ok = true;
  for (let i = 0; i < 5; i++) ok = solveLeastCost(solver, problem).ok && ok;
  const times: number[] = [];
  for (let i = 0; i < rounds; i++) {
    const started = performance.now();
    solveLeastCost(solver, problem);
    times.push(performance.now() - started);
  }
  times.sort((a, b) => a - b);
  return { median: times[Math.floor(rounds / 2)]!, ok };
}
