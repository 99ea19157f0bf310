import type { Decimal } from "decimal.js";
import { ZERO, displayQuotient } from "./decimal";
import type { ModelConstraint } from "./least-cost-model";

/** One exact inequality Σ coefficients[i] × x[i] ≥ 0 (or ≤ 0, or < 0) over the line percents. */
export interface ExactInequality {
  readonly coefficients: readonly Decimal[];
  readonly relation: "≥" | "≤" | "<";
}

function rowAt(constraint: ModelConstraint, bound: Decimal): Decimal[] {
  return constraint.amount.map((a, i) => a.minus(bound.times(constraint.mass[i]!)));
}

/**
 * What a constraint means on the bench grid, as exact inequalities. Minimums and maximums are
 * themselves. A target cannot be hit exactly on a grid, so it becomes a band one grid step wide
 * on the side its direction allows (solveForTarget's rule): "atLeast" = [target, target + step],
 * "atMost" = [target − step, target], "nearest" = [target − step, target + step].
 */
export function exactInequalities(constraint: ModelConstraint, step: Decimal): ExactInequality[] {
  const { bound } = constraint;
  if (constraint.sense === "min") return [{ coefficients: rowAt(constraint, bound), relation: "≥" }];
  if (constraint.sense === "max") return [{ coefficients: rowAt(constraint, bound), relation: constraint.strict ? "<" : "≤" }];
  if (constraint.kind === "lock") return [{ coefficients: rowAt(constraint, bound), relation: "≥" }, { coefficients: rowAt(constraint, bound), relation: "≤" }];
  const direction = constraint.direction ?? "nearest";
  const low = direction === "atLeast" ? bound : bound.minus(step);
  const high = direction === "atMost" ? bound : bound.plus(step);
  return [
    { coefficients: rowAt(constraint, low), relation: "≥" },
    { coefficients: rowAt(constraint, high), relation: "≤" },
  ];
}

function dot(coefficients: readonly Decimal[], x: readonly Decimal[]): Decimal {
  return coefficients.reduce((sum, c, i) => (c.isZero() ? sum : sum.plus(c.times(x[i]!))), ZERO);
}

/** The outcome of one constraint at an exact mix. */
export interface ExactCheck {
  readonly pass: boolean;
  /** The figure: amount / mass (a percentage of the basis, or cost per kg). */
  readonly actual: Decimal;
  /** |actual − bound| when it fails. */
  readonly slippedBy?: Decimal;
}

/**
 * Checks one constraint at exact percents `x`, by cross-multiplied comparisons (no division, as
 * evaluateRecipe does): a figure exactly at a minimum passes, exactly at a "less than" maximum
 * fails. A basis without mass fails.
 */
export function checkConstraint(constraint: ModelConstraint, x: readonly Decimal[], step: Decimal): ExactCheck {
  const mass = dot(constraint.mass, x);
  const actual = mass.gt(ZERO) ? displayQuotient(dot(constraint.amount, x), mass) : ZERO;
  const pass =
    mass.gt(ZERO) &&
    exactInequalities(constraint, step).every(({ coefficients, relation }) => {
      const value = dot(coefficients, x);
      return relation === "≥" ? value.gte(ZERO) : relation === "≤" ? value.lte(ZERO) : value.lt(ZERO);
    });
  return pass ? { pass, actual } : { pass, actual, slippedBy: actual.minus(constraint.bound).abs() };
}
