import Decimal from "decimal.js";
import { beforeAll, describe, expect, it } from "vitest";
import { solveLeastCost, type LpSolver } from "@/lib/formulation";
import { HUNDRED, ZERO } from "@/lib/formulation/decimal";
import { checkConstraint } from "@/lib/formulation/least-cost-check";
import { enumerateRoundings, enumerateWindow } from "@/lib/formulation/least-cost-enumerate";
import { gridConstraintRows, gridCost, percentsAt, type Grid } from "@/lib/formulation/least-cost-grid";
import { runLp } from "@/lib/formulation/least-cost-highs";
import { buildLp } from "@/lib/formulation/least-cost-lp";
import { buildLeastCostModel } from "@/lib/formulation/least-cost-model";
import { MILK_20, problemOf } from "@/scripts/bench-optimizer-problems";
import { solver } from "./fixtures";

let highs: LpSolver;
beforeAll(async () => {
  highs = await solver();
});

// The benchmark's 20-line milk (scripts/bench-optimizer-problems.ts: invented prices, every
// standards category of milk chocolate ticked) is a case where no floor-or-ceiling rounding of the
// optimum meets every constraint, so the wider window decides before any integer search.
describe("the window rounding of the least-cost mix", () => {
  it("finds the cheapest grid mix one step either side of the used lines, as a brute-force walk of the same box does", () => {
    const problem = problemOf(MILK_20);
    const model = buildLeastCostModel(problem);
    const optimum = runLp(highs, buildLp(model, model.constraints, { kind: "cost" })).x!;
    const free = model.lines.flatMap((line, i) => (line.locked ? [] : [i]));
    const fixed = model.lines.map((line) => (line.locked ? line.current : ZERO));
    const left = HUNDRED.minus(fixed.reduce((a, b) => a.plus(b), ZERO));
    const grid: Grid = { step: model.resolution, free, steps: left.div(model.resolution).toNumber(), fixed };
    const rows = gridConstraintRows(model, grid);
    expect(enumerateRoundings(model, grid, optimum, rows)).toEqual([]);
    const ranked = enumerateWindow(model, grid, optimum, rows);
    expect(ranked.length).toBeGreaterThan(0);

    // Brute force: every point of the box, checked with exact decimals, cheapest first.
    const steps = free.map((line) => optimum[line]! / 0.1);
    const lower = steps.map((s) => (s > 1e-7 ? Math.max(0, Math.floor(s + 1e-9) - 1) : 0));
    const upper = steps.map((s) => (s > 1e-7 ? Math.ceil(s - 1e-9) + 1 : 0));
    const perStep = gridCost(model, grid).perStep;
    let best: { y: number[]; cost: Decimal } | undefined;
    const y = new Array<number>(free.length).fill(0);
    const walk = (k: number, rest: number): void => {
      if (k === free.length) {
        if (rest !== 0) return;
        const x = percentsAt(grid, y);
        if (!model.constraints.every((c) => checkConstraint(c, x, model.resolution).pass)) return;
        const cost = y.reduce((sum, v, i) => sum.plus(perStep[i]!.times(v)), new Decimal(0));
        if (best === undefined || cost.lt(best.cost)) best = { y: [...y], cost };
        return;
      }
      for (let v = lower[k]!; v <= Math.min(upper[k]!, rest); v++) {
        y[k] = v;
        walk(k + 1, rest - v);
      }
    };
    walk(0, grid.steps);
    expect(best).toBeDefined();
    expect(ranked[0]).toEqual(best!.y);

    // solveLeastCost proposes that mix, verified by the standards check.
    const result = solveLeastCost(highs, problem);
    if (!result.ok) throw new Error(result.message);
    expect(result.lines.map((l) => l.percent)).toEqual(percentsAt(grid, best!.y).map((d) => d.toFixed()));
    expect(result.verified).toBe(true);
  });
});
