import { buildLp } from "./least-cost-lp";
import { runLp, type LpSolver } from "./least-cost-highs";
import type { LeastCostModel, ModelConstraint } from "./least-cost-model";
import type { ConflictMember, LeastCostConstraintKind } from "./least-cost-types";

/**
 * Order in which constraints are tried for removal. The deletion filter drops whatever it can,
 * trying the first kinds first, so the kinds late in this list are the ones an explanation
 * names when several small conflicts exist: the user's own targets and bounds before the
 * incidental ones.
 */
const REMOVAL_ORDER: readonly LeastCostConstraintKind[] = [
  "cost-cap",
  "inclusions",
  "standard",
  "lock",
  "line-min",
  "line-max",
  "limit-min",
  "limit-max",
  "target",
];

function feasible(solver: LpSolver, model: LeastCostModel, constraints: readonly ModelConstraint[]): boolean {
  // A solver failure proves nothing: count it as feasible so the constraint is kept.
  return runLp(solver, buildLp(model, constraints, { kind: "feasibility" })).status !== "infeasible";
}

/**
 * A small set of constraints that cannot hold together, found by relaxing the constraints one at
 * a time (the deletion filter): a constraint whose removal leaves the rest still infeasible is
 * dropped for good; one whose removal makes the rest feasible is kept. What remains is
 * irreducible — dropping any one member makes the others feasible. The sum to 100 % and the
 * 0–100 % range of each line are never relaxed. Returns [] when the whole set is feasible.
 */
export function findConflict(solver: LpSolver, model: LeastCostModel): ModelConstraint[] {
  let active = [...model.constraints];
  if (feasible(solver, model, active)) return [];
  const order = [...active].sort((a, b) => REMOVAL_ORDER.indexOf(a.kind) - REMOVAL_ORDER.indexOf(b.kind));
  for (const candidate of order) {
    const without = active.filter((c) => c !== candidate);
    if (!feasible(solver, model, without)) active = without;
  }
  return active;
}

/**
 * One sentence naming the conflict: "70 % … and at most 25 % Cocoa nibs cannot both hold with
 * these ingredients."
 */
export function conflictSentence(members: readonly ConflictMember[]): string {
  const labels = members.map((m) => m.label);
  if (labels.length === 0) return "The lines cannot make up 100 % of the recipe.";
  const list = labels.length === 1 ? labels[0]! : `${labels.slice(0, -1).join(", ")} and ${labels[labels.length - 1]}`;
  const verb = labels.length === 1 ? "cannot hold" : labels.length === 2 ? "cannot both hold" : "cannot all hold";
  return `${list.charAt(0).toUpperCase()}${list.slice(1)} ${verb} with these ingredients.`;
}

/** The public view of a constraint. */
export function memberOf(constraint: ModelConstraint): ConflictMember {
  const member: ConflictMember = { id: constraint.id, kind: constraint.kind, label: constraint.label };
  if (constraint.clause !== undefined) member.clause = constraint.clause;
  return member;
}
