import type { Decimal } from "decimal.js";
import { Dec, HUNDRED, ZERO } from "./decimal";
import { exactInequalities, type ExactInequality } from "./least-cost-check";
import type { NumericLp } from "./least-cost-highs";
import type { LeastCostModel } from "./least-cost-model";

/**
 * The bench grid: each free line is residue + step × y with y a whole number of steps; locked
 * lines keep their percent. `residue` is non-zero on one line only, when the locked lines leave
 * an amount that is not a whole number of steps.
 */
export interface Grid {
  readonly step: Decimal;
  readonly free: readonly number[];
  /** Σ y over the free lines. */
  readonly steps: number;
  /** Fixed part of each line: the locked percent, or the residue (usually 0) of a free line. */
  readonly fixed: readonly Decimal[];
}

/** The exact percents of a grid point y (one whole number per free line). */
export function percentsAt(grid: Grid, y: readonly number[]): Decimal[] {
  const x = [...grid.fixed];
  grid.free.forEach((line, k) => {
    x[line] = x[line]!.plus(grid.step.times(y[k] ?? 0));
  });
  return x;
}

type Row = NumericLp["rows"][number];

/** Largest integer coefficient kept exact in a double after summing up to 10^5 terms. */
const EXACT_LIMIT = 2 ** 50 / 1e5;

/**
 * One exact inequality Σ c_i x_i (rel) 0 as a row over the grid's y. When its coefficients
 * become whole numbers after scaling by 10^k (k ≤ 9), the row is stated in those whole numbers
 * and its bound is moved half a unit into the feasible side: the activity of a whole-number y is
 * itself whole, so the solver's float tolerance (1e-7) can neither admit a point that fails the
 * exact test by one unit nor reject one that meets it exactly. Otherwise the row is passed as
 * floats and the exact re-check afterwards decides.
 */
function gridRow(inequality: ExactInequality, grid: Grid, width: number): Row {
  const { coefficients, relation } = inequality;
  const constant = coefficients.reduce((sum, c, i) => sum.plus(c.times(grid.fixed[i]!)), ZERO);
  const onSteps = grid.free.map((line) => coefficients[line]!.times(grid.step));
  const places = Math.max(0, ...onSteps.map((c) => c.decimalPlaces()));
  const pad = (values: number[]) => [...values, ...new Array<number>(width - values.length).fill(0)];
  if (places <= 9) {
    const scale = new Dec(10).pow(places);
    const whole = onSteps.map((c) => c.times(scale));
    if (whole.every((c) => c.abs().lt(EXACT_LIMIT))) {
      const rhs = constant.times(scale).neg();
      const coefficientsOnY = pad(whole.map((c) => c.toNumber()));
      if (relation === "≥") return { coefficients: coefficientsOnY, lower: rhs.ceil().toNumber() - 0.5, upper: Infinity };
      if (relation === "≤") return { coefficients: coefficientsOnY, lower: -Infinity, upper: rhs.floor().toNumber() + 0.5 };
      return { coefficients: coefficientsOnY, lower: -Infinity, upper: rhs.ceil().toNumber() - 0.5 };
    }
  }
  const rhs = constant.neg().toNumber();
  const floats = pad(onSteps.map((c) => c.toNumber()));
  if (relation === "≥") return { coefficients: floats, lower: rhs, upper: Infinity };
  return { coefficients: floats, lower: -Infinity, upper: relation === "<" ? rhs - 1e-9 : rhs };
}

/** Every constraint of the model (locks aside: locked lines are fixed) as rows over the steps. */
export function gridConstraintRows(model: LeastCostModel, grid: Grid, width = grid.free.length): Row[] {
  const rows: Row[] = [];
  for (const constraint of model.constraints) {
    if (constraint.kind === "lock") continue;
    for (const inequality of exactInequalities(constraint, grid.step)) rows.push(gridRow(inequality, grid, width));
  }
  return rows;
}

/** Cost per kg of each free line's steps, and of the fixed part. */
export function gridCost(model: LeastCostModel, grid: Grid): { perStep: Decimal[]; fixed: Decimal } {
  const price = (i: number) => (model.lines[i]!.parsed.pricePerKg ?? ZERO).div(HUNDRED);
  const fixed = grid.fixed.reduce((sum, x, i) => sum.plus(price(i).times(x)), ZERO);
  return { perStep: grid.free.map((line) => price(line).times(grid.step)), fixed };
}

/** Bounds on each free line's whole number of steps. */
export interface GridWindow {
  readonly lower: readonly number[];
  readonly upper: readonly number[];
}

/** Seconds an integer search may take: narrow (a window around the optimum) and over the whole grid. */
const NARROW_TIME_LIMIT = 0.5;
const WIDE_TIME_LIMIT = 2;

export type GridGoal = { kind: "cost" } | { kind: "closest"; costCeiling: Decimal };

/**
 * The integer programme over the grid: every constraint of the model as exact inequalities
 * (targets as one-step bands), Σ steps fixed, and either the cost per kg to minimise or — for
 * "closest" — the distance Σ |x − current| to minimise under a cost ceiling.
 */
export function buildGridLp(model: LeastCostModel, grid: Grid, goal: GridGoal, window?: GridWindow): NumericLp {
  const m = grid.free.length;
  const width = goal.kind === "closest" ? 2 * m : m;
  const rows: Row[] = [{ coefficients: [...new Array<number>(m).fill(1), ...new Array<number>(width - m).fill(0)], lower: grid.steps, upper: grid.steps }];
  rows.push(...gridConstraintRows(model, grid, width));
  const cost = gridCost(model, grid);
  let objective = [...cost.perStep.map((c) => c.toNumber()), ...new Array<number>(width - m).fill(0)];
  if (goal.kind === "closest") {
    rows.push(costCeilingRow(cost, goal.costCeiling, width));
    objective = [...new Array<number>(m).fill(0), ...new Array<number>(m).fill(1)];
    grid.free.forEach((line, k) => {
      const offset = grid.fixed[line]!.minus(model.lines[line]!.current).toNumber();
      const step = grid.step.toNumber();
      const up = new Array<number>(width).fill(0);
      up[k] = -step;
      up[m + k] = 1;
      rows.push({ coefficients: up, lower: offset, upper: Infinity }); // d ≥ x − current
      const down = new Array<number>(width).fill(0);
      down[k] = step;
      down[m + k] = 1;
      rows.push({ coefficients: down, lower: -offset, upper: Infinity }); // d ≥ current − x
    });
  }
  return {
    cost: objective,
    colLower: [...(window?.lower ?? new Array<number>(m).fill(0)), ...new Array<number>(width - m).fill(0)],
    colUpper: [...(window?.upper ?? new Array<number>(m).fill(grid.steps)), ...new Array<number>(width - m).fill(Infinity)],
    integer: [...new Array<boolean>(m).fill(true), ...new Array<boolean>(width - m).fill(false)],
    rows,
    timeLimitSeconds: window === undefined ? WIDE_TIME_LIMIT : NARROW_TIME_LIMIT,
  };
}

/**
 * Cost per kg ≤ ceiling over the grid. Prices have few decimals, so the row is usually stated in
 * whole numbers (as gridRow does) and a mix exactly at the ceiling is admitted.
 */
function costCeilingRow(cost: { perStep: Decimal[]; fixed: Decimal }, ceiling: Decimal, width: number): Row {
  const places = Math.max(0, ...cost.perStep.map((c) => c.decimalPlaces()));
  const pad = (values: number[]) => [...values, ...new Array<number>(width - values.length).fill(0)];
  if (places <= 12) {
    const scale = new Dec(10).pow(places);
    const rhs = ceiling.minus(cost.fixed).times(scale);
    return { coefficients: pad(cost.perStep.map((c) => c.times(scale).toNumber())), lower: -Infinity, upper: rhs.floor().toNumber() + 0.5 };
  }
  return { coefficients: pad(cost.perStep.map((c) => c.toNumber())), lower: -Infinity, upper: ceiling.minus(cost.fixed).toNumber() + 1e-9 };
}
