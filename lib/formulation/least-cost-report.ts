import type { Decimal } from "decimal.js";
import { Dec, toDecimalString } from "./decimal";
import { evaluateRecipe } from "./evaluate";
import { checkConstraint } from "./least-cost-check";
import { isBinding } from "./least-cost-lp";
import type { LeastCostModel, ModelConstraint } from "./least-cost-model";
import type { RoundedMix } from "./least-cost-rounding";
import type { LeastCostConstraintReport, LeastCostProblem, LeastCostProposalLine, LeastCostSolution } from "./least-cost-types";
import type { RecipeLine } from "./types";

/** A float from the solver as a short decimal string (6 places, no trailing zeros, no "-0"). */
export function solverFigure(value: number): string {
  return toDecimalString(new Dec(value.toFixed(6)));
}

function relationOf(constraint: ModelConstraint): LeastCostConstraintReport["relation"] {
  if (constraint.sense === "equal") return "=";
  if (constraint.sense === "min") return "≥";
  return constraint.strict ? "<" : "≤";
}

function reportConstraint(constraint: ModelConstraint, x: readonly Decimal[], step: Decimal, optimum: readonly number[]): LeastCostConstraintReport {
  const check = checkConstraint(constraint, x, step);
  const report: LeastCostConstraintReport = {
    id: constraint.id,
    kind: constraint.kind,
    label: constraint.label,
    relation: relationOf(constraint),
    bound: toDecimalString(constraint.bound),
    unit: constraint.unit,
    actual: toDecimalString(check.actual),
    pass: check.pass,
    binding: isBinding(constraint, optimum),
  };
  if (constraint.clause !== undefined) report.clause = constraint.clause;
  if (check.slippedBy !== undefined) report.slippedBy = toDecimalString(check.slippedBy);
  return report;
}

export interface ReportInput {
  model: LeastCostModel;
  problem: LeastCostProblem;
  /** The solver's float optimum (line percents). */
  optimum: readonly number[];
  rounded: RoundedMix;
  currentCostPerKg?: string;
  /** The cheapest cost per kg the solver found (before rounding). */
  optimalCost: number;
}

/**
 * The solution as the bench shows it. The proposal is re-evaluated by evaluateRecipe — the
 * engine's own check — and `verified` is true only when every constraint holds exactly and
 * evaluateRecipe passes every chosen category; any disagreement is said in `notes`.
 */
export function reportSolution({ model, problem, optimum, rounded, currentCostPerKg, optimalCost }: ReportInput): LeastCostSolution {
  const x = rounded.percents;
  const recipeLines: RecipeLine[] = problem.lines.map((line, i) => ({ ingredient: line.ingredient, percent: toDecimalString(x[i]!) }));
  const evaluation = evaluateRecipe({ lines: recipeLines }, { codex: problem.codex });
  const constraints = model.constraints.map((c) => reportConstraint(c, x, model.resolution, optimum));
  const notes = [...model.notes, ...rounded.notes];
  let categoriesPass = true;
  for (const ref of model.categories) {
    const result = evaluation.standards.find((s) => s.authority === ref.authority && s.category === ref.category);
    if (result?.pass !== true) {
      categoriesPass = false;
      notes.push(`The standards check finds ${ref.authority} ${ref.category} not met by the proposed mix.`);
    }
  }
  const slipped = constraints.filter((c) => !c.pass);
  for (const c of slipped) notes.push(`${c.label}: the rounded mix reaches ${c.actual}${c.unit === "%" ? " %" : " per kg"}, off by ${c.slippedBy}.`);
  const lines: LeastCostProposalLine[] = model.lines.map((line, i) => ({
    index: i,
    name: line.name,
    percent: toDecimalString(x[i]!),
    optimalPercent: solverFigure(optimum[i] ?? 0),
    currentPercent: toDecimalString(line.current),
    change: toDecimalString(x[i]!.minus(line.current)),
  }));
  const solution: LeastCostSolution = {
    ok: true,
    lines,
    optimalCostPerKg: solverFigure(optimalCost),
    constraints,
    verified: slipped.length === 0 && categoriesPass,
    rounding: { resolution: toDecimalString(model.resolution), method: rounded.method, slipped: slipped.map((c) => c.id), notes: rounded.notes },
    evaluation,
    notes,
  };
  if (evaluation.costPerKg !== undefined) solution.costPerKg = evaluation.costPerKg;
  if (currentCostPerKg !== undefined) solution.currentCostPerKg = currentCostPerKg;
  if (currentCostPerKg !== undefined && evaluation.costPerKg !== undefined) {
    solution.saving = toDecimalString(new Dec(currentCostPerKg).minus(evaluation.costPerKg));
  }
  return solution;
}
