import type { Decimal } from "decimal.js";
import { Dec, HUNDRED, ZERO, toDecimalString } from "./decimal";
import { distribute } from "./distribute";
import { commonScale, formatUnits, powerOfTen, toUnits } from "./fixed";
import { checkConstraint } from "./least-cost-check";
import { enumerateRoundings, enumerateWindow } from "./least-cost-enumerate";
import { buildGridLp, gridConstraintRows, percentsAt, type Grid, type GridGoal, type GridWindow } from "./least-cost-grid";
import { runLp, type LpSolver } from "./least-cost-highs";
import type { LeastCostModel } from "./least-cost-model";
import { ingredientCostPerKg } from "./cost-per-kg";

/** The rounded mix. */
export interface RoundedMix {
  readonly percents: Decimal[];
  readonly method: "grid" | "nearest";
  readonly notes: string[];
}

/** The solver's float optimum as decimals with 9 places (its own precision is ~1e-9). */
export function optimumAsDecimals(x: readonly number[]): Decimal[] {
  return x.map((v) => new Dec(Math.max(0, v).toFixed(9)));
}

function makeGrid(model: LeastCostModel, optimum: readonly number[], notes: string[]): Grid | undefined {
  const step = model.resolution;
  const free = model.lines.flatMap((line, i) => (line.locked ? [] : [i]));
  const fixed = model.lines.map((line) => (line.locked ? line.current : ZERO));
  const left = HUNDRED.minus(fixed.reduce((a, b) => a.plus(b), ZERO));
  if (free.length === 0 || left.isNegative()) return undefined;
  const steps = left.div(step).floor();
  const residue = left.minus(steps.times(step));
  if (!residue.isZero()) {
    const carrier = free.reduce((best, i) => ((optimum[i] ?? 0) > (optimum[best] ?? 0) ? i : best), free[0]!);
    fixed[carrier] = residue;
    notes.push(`The locked lines leave ${toDecimalString(left)} %, which is off the ${toDecimalString(step)} % grid; ${model.lines[carrier]!.name} carries the extra ${toDecimalString(residue)} %.`);
  }
  return { step, free, steps: steps.toNumber(), fixed };
}

/** Each free line's steps within one step of the optimum (floor − 1 … ceil + 1). */
function windowAround(grid: Grid, optimum: readonly number[]): GridWindow {
  const step = grid.step.toNumber();
  const lower: number[] = [];
  const upper: number[] = [];
  grid.free.forEach((line) => {
    const steps = Math.max(0, ((optimum[line] ?? 0) - grid.fixed[line]!.toNumber()) / step);
    lower.push(Math.max(0, Math.floor(steps + 1e-9) - 1));
    upper.push(Math.min(grid.steps, Math.ceil(steps - 1e-9) + 1));
  });
  return { lower, upper };
}

function meetsAll(model: LeastCostModel, x: readonly Decimal[]): boolean {
  return model.constraints.every((c) => checkConstraint(c, x, model.resolution).pass);
}

function exactCost(model: LeastCostModel, x: readonly Decimal[]): Decimal | undefined {
  const cost = ingredientCostPerKg(model.lines.map((line, i) => ({ ...line.parsed, percent: x[i]! })));
  return cost.ok ? cost.perKg : undefined;
}

/** Best grid point for the goal, re-checked exactly; undefined when none is found or it fails. */
function searchGrid(solver: LpSolver, model: LeastCostModel, grid: Grid, goal: GridGoal, window?: GridWindow): Decimal[] | undefined {
  const outcome = runLp(solver, buildGridLp(model, grid, goal, window));
  if (outcome.x === undefined) return undefined;
  const y = grid.free.map((_, k) => Math.round(outcome.x![k]!));
  const x = percentsAt(grid, y);
  return meetsAll(model, x) ? x : undefined;
}

/** Ranked grid points looked at, at most, before the integer search takes over. */
const MAX_CHECKED = 50;

/** The first of the ranked grid points that meets every constraint with exact decimals. */
function firstPassing(model: LeastCostModel, grid: Grid, ranked: readonly number[][]): Decimal[] | undefined {
  for (const y of ranked.slice(0, MAX_CHECKED)) {
    const x = percentsAt(grid, y);
    if (meetsAll(model, x)) return x;
  }
  return undefined;
}

/** Largest-remainder rounding of the optimum, locked lines kept (the slider rule's own code). */
function nearest(model: LeastCostModel, optimum: readonly number[]): Decimal[] {
  const values = optimumAsDecimals(optimum).map((v, i) => (model.lines[i]!.locked ? model.lines[i]!.current : v));
  const scale = commonScale([...values, model.resolution]);
  const out = distribute({
    current: values.map((v) => toUnits(v, scale)),
    locked: model.lines.map((line) => line.locked),
    whole: 100n * powerOfTen(scale),
    step: toUnits(model.resolution, scale),
    changed: -1,
    requested: 0n,
    low: 0n,
    high: 0n,
  });
  return out.values.map((v) => new Dec(formatUnits(v, scale)));
}

/**
 * Brings the solver's optimum onto the bench grid. First each line between two steps goes to its
 * floor or ceiling, and the best such rounding that meets every constraint wins
 * (enumerateRoundings); if none does, the same over one more step either side of each line the
 * optimum uses (enumerateWindow, milliseconds). If none does, an integer search (HiGHS) finds the best grid mix that
 * meets every constraint within one step of the optimum, then over the whole grid (for
 * "closest", the nearest grid mix among the cheapest, or under the user's ceiling). Every answer
 * is re-checked with exact decimals. Only if no grid mix passes does it fall back to plain largest-remainder
 * rounding, and the caller then reports which constraints slipped and by how much.
 */
export function roundToGrid(solver: LpSolver, model: LeastCostModel, optimum: readonly number[]): RoundedMix {
  const notes: string[] = [];
  const grid = makeGrid(model, optimum, notes);
  if (grid !== undefined) {
    const rows = gridConstraintRows(model, grid);
    const quick = firstPassing(model, grid, enumerateRoundings(model, grid, optimum, rows)) ?? firstPassing(model, grid, enumerateWindow(model, grid, optimum, rows));
    if (quick !== undefined) return { percents: quick, method: "grid", notes };
    // Then an integer search one step either side of the optimum, then the whole grid (slower).
    const window = windowAround(grid, optimum);
    let searched: GridWindow | undefined = window;
    let cheapest = searchGrid(solver, model, grid, { kind: "cost" }, window);
    if (cheapest === undefined) {
      searched = undefined;
      cheapest = searchGrid(solver, model, grid, { kind: "cost" });
    }
    let found = cheapest;
    if (cheapest !== undefined && model.objective.kind === "closest") {
      const ceiling = model.objective.cap ?? exactCost(model, cheapest);
      found = ceiling === undefined ? cheapest : (searchGrid(solver, model, grid, { kind: "closest", costCeiling: ceiling }, searched) ?? cheapest);
    }
    if (found !== undefined) return { percents: found, method: "grid", notes };
  }
  notes.push(`No mix on the ${toDecimalString(model.resolution)} % grid meets every constraint; the optimum was rounded to the nearest grid mix instead.`);
  return { percents: nearest(model, optimum), method: "nearest", notes };
}
