import { beforeAll, describe, expect, it } from "vitest";
import { solveLeastCost, type LeastCostResult, type LeastCostSolution, type LpSolver } from "@/lib/formulation";
import { COCOA_BUTTER, LECITHIN, NIBS, POWDER, SUGAR, line, near, solver } from "./fixtures";

let highs: LpSolver;
beforeAll(async () => {
  highs = await solver();
});

function solved(result: LeastCostResult): LeastCostSolution {
  if (!result.ok) throw new Error(`expected a solution, got: ${result.message}`);
  return result;
}
const percents = (s: LeastCostSolution) => s.lines.map((l) => l.percent);
const binding = (s: LeastCostSolution) => s.constraints.filter((c) => c.binding).map((c) => c.id);

describe("solveLeastCost on problems solved by hand", () => {
  it("two ingredients: the minimum on total dry cocoa solids sets the nibs", () => {
    // Nibs n (98 % dry cocoa solids, 9/kg) and sugar s (1.2/kg), n + s = 100; dry cocoa solids
    // ≥ 49 % of the product: 0.98 n ≥ 49 → n ≥ 50. Cost 0.09 n + 0.012 s falls with n, so
    // n = 50, s = 50, cost = (9 × 50 + 1.2 × 50) / 100 = 5.1 per kg. On the 0.1 % grid already.
    const s = solved(solveLeastCost(highs, {
      lines: [line(NIBS, 60), line(SUGAR, 40)],
      limits: [{ quantity: "totalDryCocoaSolids", min: 49 }],
    }));
    expect(percents(s)).toEqual(["50", "50"]);
    expect(s.costPerKg).toBe("5.1");
    expect(near(s.optimalCostPerKg, 5.1)).toBe(true);
    // Current 60/40: (540 + 48) / 100 = 5.88 per kg, so the proposal saves 0.78.
    expect(s.currentCostPerKg).toBe("5.88");
    expect(s.saving).toBe("0.78");
    expect(binding(s)).toEqual(["limit-min:0"]);
    expect(s.verified).toBe(true);
  });

  it("two ingredients on the Codex dry basis: the ratio is linearised, not approximated", () => {
    // Codex counts on dry matter: 0.98 n ≥ 0.5 × (100 − 0.02 n) ⇔ 0.99 n ≥ 50 ⇔ n ≥ 50.50505…
    // LP cost = (9 × 50.505051 + 1.2 × 49.494949) / 100 = 5.139394. On the 0.1 % grid the
    // minimum rounds up: 50.5 gives 0.99 × 50.5 = 49.995 < 50 (fails), 50.6 gives 50.094 (meets,
    // i.e. 49.588 / 98.988 = 50.09496… % of dry matter); cost (455.4 + 59.28) / 100 = 5.1468.
    const s = solved(solveLeastCost(highs, {
      lines: [line(NIBS, 60), line(SUGAR, 40)],
      limits: [{ quantity: "totalDryCocoaSolids", basis: "codex", min: 50 }],
    }));
    expect(near(s.lines[0]!.optimalPercent, 50.505051)).toBe(true);
    expect(near(s.optimalCostPerKg, 5.139394)).toBe(true);
    expect(percents(s)).toEqual(["50.6", "49.4"]);
    expect(s.costPerKg).toBe("5.1468");
    expect(s.evaluation.bases.codex.totalDryCocoaSolids.startsWith("50.09496")).toBe(true);
  });

  it("four ingredients: a 70 % dark meeting EU and Codex chocolate, ≥ 8 % added butter, ≤ 0.5 % lecithin", () => {
    // The example. Nibs n (9/kg), cocoa butter b (14/kg, ≥ 8 %), sugar s (1.2/kg),
    // lecithin l (6/kg, ≤ 0.5 %); 70 % dry cocoa solids on the EU basis: 0.98 n + b = 70.
    // Lecithin only costs more than sugar: l = 0. Each point of cocoa solids bought by replacing
    // sugar costs (9 − 1.2) / 0.98 = 7.96 with nibs and 14 − 1.2 = 12.8 with butter, so butter
    // stays at its 8 % minimum: n = 62 / 0.98 = 63.265306, s = 28.734694,
    // cost = (9 × 63.265306 + 14 × 8 + 1.2 × 28.734694) / 100 = 7.158694 per kg.
    // EU chocolate (Annex I A.3(a)): butter 0.55 n + b = 42.8 ≥ 18, non-fat 0.43 n = 27.2 ≥ 14;
    // Codex 2.1.1 on dry matter (100 − 0.02 n = 98.73): all above their minimums — not binding.
    // On the 0.1 % grid: n = 63.3 gives 0.98 × 63.3 + 8 = 70.034 (target met on its upper side),
    // s = 28.7: cost (569.7 + 112 + 34.44) / 100 = 7.1614.
    const s = solved(solveLeastCost(highs, {
      lines: [line(NIBS, 60), line(COCOA_BUTTER, 10, { min: 8 }), line(SUGAR, "29.6"), line(LECITHIN, "0.4", { max: "0.5" })],
      limits: [{ quantity: "totalDryCocoaSolids", basis: "eu", value: 70 }],
      categories: [{ authority: "EU", category: "chocolate" }, { authority: "Codex", category: "chocolate" }],
    }));
    expect(s.lines.map((l) => l.optimalPercent)).toEqual(["63.265306", "8", "28.734694", "0"]);
    expect(s.optimalCostPerKg).toBe("7.158694");
    expect(percents(s)).toEqual(["63.3", "8", "28.7", "0"]);
    expect(s.costPerKg).toBe("7.1614");
    expect(binding(s)).toEqual(["line-min:1", "target:0"]);
    expect(s.constraints.find((c) => c.id === "target:0")?.actual).toBe("70.034");
    // evaluateRecipe, the engine's own check, agrees.
    const pass = Object.fromEntries(s.evaluation.standards.map((r) => [`${r.authority} ${r.category}`, r.pass]));
    expect(pass["EU chocolate"]).toBe(true);
    expect(pass["Codex chocolate"]).toBe(true);
    expect(s.evaluation.composition.cocoaSolidsStatement).toBe("70");
    expect(s.verified).toBe(true);
  });

  it("four ingredients: cheap cocoa powder, held back by the EU cocoa butter minimum", () => {
    // Powder p (97 % dry cocoa solids, 11 % butter, 5/kg), butter b (14/kg), sugar s (1.2/kg),
    // nibs n (9/kg). EU chocolate, dry cocoa solids ≥ 70 % (no inclusions: EU basis = product).
    // Guess the basis {p, n, s} with b = 0 and the two minimums tight:
    //   0.97 p + 0.98 n = 70 (dry cocoa solids) and 0.11 p + 0.55 n = 18 (cocoa butter, A.3(a)).
    //   det = 0.97 × 0.55 − 0.98 × 0.11 = 0.4257; p = (70 × 0.55 − 0.98 × 18) / 0.4257 =
    //   20.86 / 0.4257 = 49.001644; n = (0.97 × 18 − 0.11 × 70) / 0.4257 = 9.76 / 0.4257 =
    //   22.926944; s = 28.071412. Non-fat 0.86 p + 0.43 n = 52.0 ≥ 14 holds.
    // Check optimality with the duals: λ = 1.2 (sugar); 0.97 μ + 0.11 ν = 3.8 and
    // 0.98 μ + 0.55 ν = 7.8 give ν = 9.0251, μ = 2.8941; butter's reduced cost
    // 14 − (1.2 + μ + ν) = 0.88 > 0, so adding butter would cost more: optimal.
    // Cost = (5 × 49.001644 + 9 × 22.926944 + 1.2 × 28.071412) / 100 = 4.850364 per kg.
    const s = solved(solveLeastCost(highs, {
      lines: [line(POWDER, 10), line(COCOA_BUTTER, 10), line(SUGAR, 30), line(NIBS, 50)],
      limits: [{ quantity: "totalDryCocoaSolids", basis: "eu", min: 70 }],
      categories: [{ authority: "EU", category: "chocolate" }],
    }));
    const optimal = s.lines.map((l) => Number(l.optimalPercent));
    expect(near(optimal[0]!, 49.001644)).toBe(true);
    expect(optimal[1]).toBe(0);
    expect(near(optimal[2]!, 28.071412)).toBe(true);
    expect(near(optimal[3]!, 22.926944)).toBe(true);
    expect(near(s.optimalCostPerKg, 4.850364)).toBe(true);
    expect(binding(s).sort()).toEqual(["limit-min:0", "standard:EU:chocolate:1"]);
    // The grid mix costs at least the optimum and meets everything.
    expect(Number(s.costPerKg)).toBeGreaterThanOrEqual(4.850364);
    expect(s.verified).toBe(true);
  });

  it("closest objective: among equally cheap mixes, keeps the current one", () => {
    // Two sugars at the same price: every mix costs 1.2 per kg, so the cheapest mix nearest to
    // the current 30/70 is 30/70 itself.
    const other = { ...SUGAR, name: "Beet sugar" };
    const s = solved(solveLeastCost(highs, {
      lines: [line(SUGAR, 30), line(other, 70)],
      objective: { kind: "closest" },
    }));
    expect(percents(s)).toEqual(["30", "70"]);
    expect(s.lines.map((l) => l.change)).toEqual(["0", "0"]);
  });

  it("closest objective under a cost ceiling: the smallest change that brings the cost down", () => {
    // Nibs 60 / sugar 40 costs 5.88 per kg. With at most 5.5 per kg and dry cocoa solids ≥ 49 %:
    // cost = 1.2 + 0.078 n ≤ 5.5 → n ≤ 55.128…; nearest to 60 is n = 55.128205 (LP); on the
    // grid 55.1 (5.4978 ≤ 5.5; 55.2 would cost 5.5056).
    const s = solved(solveLeastCost(highs, {
      lines: [line(NIBS, 60), line(SUGAR, 40)],
      limits: [{ quantity: "totalDryCocoaSolids", min: 49 }],
      objective: { kind: "closest", maxCostPerKg: "5.5" },
    }));
    expect(near(s.lines[0]!.optimalPercent, 55.128205)).toBe(true);
    expect(percents(s)).toEqual(["55.1", "44.9"]);
    expect(s.costPerKg).toBe("5.4978");
  });
});
