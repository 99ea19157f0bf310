/**
 * Timing of the least-cost solver in Node: the first, cold solve, then the
 * median of `ROUNDS` full solves (model, LP, rounding, exact re-check, evaluateRecipe) after
 * `WARM_UP` more, in milliseconds. The warm-up is long because Node 20's JIT needs some forty
 * solves of this decimal-heavy code before it settles (cold solves take 40–150 ms on 2 cores).
 */
import { solveLeastCost, type LeastCostProblem, type LpSolver } from "../lib/formulation";

export const WARM_UP = 60;
export const ROUNDS = 41;

/** Milliseconds; `cpu` (Node only) is the median CPU time of this process, which other load does not inflate. */
export type Timing = { first: number; median: number; cpu?: number; ok: boolean };

export function medianSolveMs(solver: LpSolver, problem: LeastCostProblem): Timing {
  const started = performance.now();
  let ok = solveLeastCost(solver, problem).ok;
  const first = performance.now() - started;
  for (let i = 0; i < WARM_UP; i++) ok = solveLeastCost(solver, problem).ok && ok;
  const times: number[] = [];
  const cpu: number[] = [];
  for (let i = 0; i < ROUNDS; i++) {
    const t = performance.now();
    const c = process.cpuUsage();
    solveLeastCost(solver, problem);
    const used = process.cpuUsage(c);
    times.push(performance.now() - t);
    cpu.push((used.user + used.system) / 1000);
  }
  const median = (values: number[]) => values.sort((a, b) => a - b)[Math.floor(values.length / 2)]!;
  return { first, median: median(times), cpu: median(cpu), ok };
}
