import { toDecimalString } from "./decimal";
import { evaluateRecipe } from "./evaluate";
import { conflictSentence, findConflict, memberOf } from "./least-cost-conflicts";
import { runLp, type LpSolver } from "./least-cost-highs";
import { buildLp } from "./least-cost-lp";
import { buildLeastCostModel, type LeastCostModel } from "./least-cost-model";
import { reportSolution } from "./least-cost-report";
import { roundToGrid } from "./least-cost-rounding";
import type { LeastCostProblem, LeastCostResult } from "./least-cost-types";

function invalid(message: string, notes: string[]): LeastCostResult {
  return { ok: false, kind: "invalid", message, notes };
}

/** Lines that may take mass but have no price: the cost cannot be minimised without one. */
function unpriced(model: LeastCostModel): string[] {
  return model.lines
    .filter((line, i) => line.parsed.pricePerKg === undefined && !(line.locked && line.current.isZero()) && !model.constraints.some((c) => c.id === `line-max:${i}` && c.bound.isZero()))
    .map((line) => line.name);
}

/** Relative slack on the cheapest cost when the "closest" objective keeps to it (float solver). */
const COST_SLACK = 1e-9;

/**
 * Finds the cheapest mix of the given lines that meets every constraint: the sum of 100 %, each
 * line's minimum, maximum or lock, the targets and ranges on composition quantities (on their
 * basis), and every minimum and maximum of the chosen standards categories (STANDARD_CATEGORIES,
 * on the bases evaluateRecipe uses). A linear programme solved by HiGHS; then brought onto the
 * bench grid (see roundToGrid) and re-checked with exact decimals and with evaluateRecipe.
 *
 * With the "closest" objective it returns, among the mixes costing no more than the cheapest
 * (or than the given ceiling), the one with the smallest total change from the current percents.
 *
 * When no mix can meet everything, it returns `kind: "infeasible"` with a small set of
 * constraints that cannot hold together and a sentence naming them. Bad input gives
 * `kind: "invalid"` with a sentence; never throws. `solver` comes from loadLpSolver().
 */
export function solveLeastCost(solver: LpSolver, problem: LeastCostProblem): LeastCostResult {
  const model = buildLeastCostModel(problem);
  const notes = model.notes;
  if (model.lines.length === 0) return invalid("Add at least one ingredient line first.", notes);
  const missing = unpriced(model);
  if (missing.length > 0) {
    return invalid(`${missing.join(", ")} ${missing.length === 1 ? "has" : "have"} no price per kg: add a quote, or set ${missing.length === 1 ? "its" : "their"} maximum to 0 %.`, notes);
  }
  const cheapest = runLp(solver, buildLp(model, model.constraints, { kind: "cost" }));
  if (cheapest.status === "infeasible") {
    const conflict = findConflict(solver, model).map(memberOf);
    return { ok: false, kind: "infeasible", message: conflictSentence(conflict), conflict, notes };
  }
  if (cheapest.status !== "optimal" || cheapest.x === undefined) return invalid("The solver could not finish this problem; try looser limits.", notes);
  let optimum = cheapest.x;
  if (model.objective.kind === "closest") {
    const floor = cheapest.objective ?? 0;
    const ceiling = model.objective.cap === undefined ? floor + COST_SLACK * Math.max(1, Math.abs(floor)) : undefined;
    const closest = runLp(solver, buildLp(model, model.constraints, { kind: "closest", costCeiling: ceiling }));
    if (closest.status === "optimal" && closest.x !== undefined) optimum = closest.x.slice(0, model.lines.length);
  }
  const rounded = roundToGrid(solver, model, optimum);
  const current = evaluateRecipe({ lines: model.lines.map((line, i) => ({ ...problem.lines[i]!, percent: toDecimalString(line.current) })) });
  return reportSolution({ model, problem, optimum, rounded, currentCostPerKg: current.costPerKg, optimalCost: cheapest.objective ?? 0 });
}
