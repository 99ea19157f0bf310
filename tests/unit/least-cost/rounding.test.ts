import { beforeAll, describe, expect, it } from "vitest";
import { solveLeastCost, type LeastCostResult, type LeastCostSolution, type LpSolver } from "@/lib/formulation";
import { COCOA_BUTTER, LECITHIN, NIBS, SUGAR, line, solver } from "./fixtures";

let highs: LpSolver;
beforeAll(async () => {
  highs = await solver();
});

function solved(result: LeastCostResult): LeastCostSolution {
  if (!result.ok) throw new Error(`expected a solution, got: ${result.message}`);
  return result;
}
const percents = (s: LeastCostSolution) => s.lines.map((l) => l.percent);

describe("solveLeastCost brings the optimum onto the bench grid", () => {
  it("repairs a rounding that would break a minimum", () => {
    // Codex dry basis, dry cocoa solids ≥ 50 %: n ≥ 50.50505… (see hand-worked.test.ts). Plain
    // rounding to 0.1 gives 50.5, where 0.99 × 50.5 = 49.995 < 50; the repair takes 50.6.
    const s = solved(solveLeastCost(highs, {
      lines: [line(NIBS, 60), line(SUGAR, 40)],
      limits: [{ quantity: "totalDryCocoaSolids", basis: "codex", min: 50 }],
    }));
    expect(percents(s)).toEqual(["50.6", "49.4"]);
    expect(s.rounding).toMatchObject({ method: "grid", slipped: [], resolution: "0.1" });
    expect(s.verified).toBe(true);
  });

  it("keeps an off-grid locked line and gives the remainder to the largest free line", () => {
    // Lecithin locked at 0.35 % leaves 99.65 %: 996 steps of 0.1 and 0.05 over, carried by the
    // nibs (the largest line of the optimum). Nibs ≥ 50 % (0.98 n ≥ 49) → 50.05; sugar 49.6.
    // Cost (9 × 50.05 + 1.2 × 49.6 + 6 × 0.35) / 100 = 5.1207.
    const s = solved(solveLeastCost(highs, {
      lines: [line(NIBS, 60), line(SUGAR, "39.65"), line(LECITHIN, "0.35", { locked: true })],
      limits: [{ quantity: "totalDryCocoaSolids", min: 49 }],
    }));
    expect(percents(s)).toEqual(["50.05", "49.6", "0.35"]);
    expect(s.costPerKg).toBe("5.1207");
    expect(s.rounding.notes.join(" ")).toContain("Cocoa nibs carries the extra 0.05 %");
  });

  it("searches the whole grid when no floor-or-ceiling rounding meets the constraints", () => {
    // Dry cocoa solids between 49.9 and 49.95 % on a 1 % grid. The optimum (cheapest cocoa:
    // nibs) is n = 50.918…; 50 nibs gives 49 %, 51 gives 49.98 %: both outside. With whole
    // percents 0.98 n + b must land in [49.9, 49.95]: n = 5 (4.9 + 45 butter = 49.9), n = 4
    // (49.92) or n = 3 (49.94). Cheapest is n = 5: (45 + 14 × 45 + 1.2 × 50) / 100 = 7.35.
    const s = solved(solveLeastCost(highs, {
      lines: [line(NIBS, 50), line(COCOA_BUTTER, 0), line(SUGAR, 50)],
      limits: [{ quantity: "totalDryCocoaSolids", min: "49.9", max: "49.95" }],
      resolution: "1",
    }));
    expect(percents(s)).toEqual(["5", "45", "50"]);
    expect(s.costPerKg).toBe("7.35");
    expect(s.verified).toBe(true);
  });

  it("says which constraint slipped, and by how much, when no grid mix meets everything", () => {
    // Between 49.1 and 49.5 % on a 1 % grid with nibs and sugar only: n would have to lie in
    // [50.10, 50.51] — no whole percent does. The optimum n = 50.102 rounds to 50: 49 %, short
    // of the 49.1 % minimum by 0.1.
    const s = solved(solveLeastCost(highs, {
      lines: [line(NIBS, 50), line(SUGAR, 50)],
      limits: [{ quantity: "totalDryCocoaSolids", min: "49.1", max: "49.5" }],
      resolution: "1",
    }));
    expect(percents(s)).toEqual(["50", "50"]);
    expect(s.rounding).toMatchObject({ method: "nearest", slipped: ["limit-min:0"] });
    expect(s.constraints.find((c) => c.id === "limit-min:0")).toMatchObject({ pass: false, actual: "49", slippedBy: "0.1" });
    expect(s.verified).toBe(false);
    expect(s.notes.join(" ")).toContain("total dry cocoa solids ≥ 49.1 %: the rounded mix reaches 49 %, off by 0.1.");
  });

  it("keeps a strict maximum strictly below its bound on the grid", () => {
    // US sweet chocolate: dry milk solids < 12 % (21 CFR 163.123(a)(2)). Milk powder is the
    // cheapest line here, so the optimum presses against 12 %; the grid mix must stay below it.
    const milk = { name: "Whole milk powder", milkFat: 26, milkSolidsNonFat: 72, moisture: 2, pricePerKg: "0.5" };
    const s = solved(solveLeastCost(highs, {
      lines: [line(NIBS, 40), line(milk, 10), line(SUGAR, 50)],
      categories: [{ authority: "US", category: "sweet chocolate" }],
    }));
    const check = s.constraints.find((c) => c.label.includes("dry milk solids < 12 %"))!;
    expect(check.pass).toBe(true);
    expect(Number(check.actual)).toBeLessThan(12);
    // 0.98 × milk < 12 → milk ≤ 12.2 on the grid (0.98 × 12.2 = 11.956; 12.3 gives 12.054).
    expect(s.lines[1]!.percent).toBe("12.2");
  });
});
