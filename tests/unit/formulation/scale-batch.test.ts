import { describe, expect, it } from "vitest";
import { scaleBatch } from "@/lib/formulation";

// Masses are grams, whole numbers of the scale's step, summing exactly to the batch (issue 3).
const DARK = [{ percent: 60 }, { percent: 10 }, { percent: "29.5" }, { percent: "0.5" }];

function ok<T>(result: ReturnType<typeof scaleBatch<T & { percent?: unknown }>>) {
  if (!result.ok) throw new Error(result.reason);
  return result;
}

describe("scaleBatch", () => {
  it("scales a 25 kg batch on a 1 g scale", () => {
    // 25 000 g × 60 / 10 / 29.5 / 0.5 % = 15 000, 2 500, 7 375, 125: exact, no rounding needed.
    const result = ok(scaleBatch(DARK, { totalMassKg: 25, resolutionGrams: 1 }));
    expect(result.lines.map((l) => l.massGrams)).toEqual(["15000", "2500", "7375", "125"]);
    expect(result.totalMassGrams).toBe("25000");
    expect(result.loads).toEqual([{ massGrams: "25000", lineMassesGrams: ["15000", "2500", "7375", "125"] }]);
    expect(result.notes).toEqual([]);
  });

  it("splits into equal machine loads that add up by line and by load", () => {
    // 25 kg in 10 kg machines: n = ceil(25 / 10) = 3 loads of 8 334, 8 333, 8 333 g.
    // Load 1: 8 334 of 25 000 → 5 000.4, 833.4, 2 458.85, 41.68 → floors 5 000 + 833 + 2 458 + 41 =
    // 8 332; two steps to the largest remainders .85 (sugar) and .68 (lecithin): 5000, 833, 2459, 42.
    const result = ok(scaleBatch(DARK, { totalMassKg: 25, resolutionGrams: 1, machineCapacityKg: 10 }));
    expect(result.loads.map((l) => l.massGrams)).toEqual(["8334", "8333", "8333"]);
    expect(result.loads[0]?.lineMassesGrams).toEqual(["5000", "833", "2459", "42"]);
    const byLine = [0, 1, 2, 3].map((i) => result.loads.reduce((sum, load) => sum + Number(load.lineMassesGrams[i]), 0));
    expect(byLine).toEqual([15000, 2500, 7375, 125]);
    for (const load of result.loads) {
      expect(load.lineMassesGrams.reduce((sum, m) => sum + Number(m), 0)).toBe(Number(load.massGrams));
    }
  });

  it("rounds the batch to the resolution and says so", () => {
    // 1.0023 kg = 1 002.3 g on a 5 g scale = 200.46 steps → 200 steps = 1 000 g.
    // 1 000 g × 60 / 10 / 29.5 / 0.5 % = 600, 100, 295, 5.
    const result = ok(scaleBatch(DARK, { totalMassKg: "1.0023", resolutionGrams: 5 }));
    expect(result.totalMassGrams).toBe("1000");
    expect(result.requestedMassGrams).toBe("1002.3");
    expect(result.lines.map((l) => l.massGrams)).toEqual(["600", "100", "295", "5"]);
    expect(result.notes).toEqual(["The batch mass was rounded to 1000 g, a whole number of 5 g steps."]);
  });

  it("uses largest remainder when shares are not whole steps", () => {
    // 1 kg of 1 : 1 : 1 on a 1 g scale: 333.33… each → 333 × 3 = 999; the last gram to the first line.
    const result = ok(scaleBatch([{ percent: 1 }, { percent: 1 }, { percent: 1 }], { totalMassKg: 1, resolutionGrams: 1 }));
    expect(result.lines.map((l) => l.massGrams)).toEqual(["334", "333", "333"]);
  });

  it("handles 100 tonnes on a 0.1 g scale exactly", () => {
    // 100 t = 100 000 000 g = 1e9 steps of 0.1 g; 29.5 % = 29 500 000 g; in 60 kg loads:
    // ceil(100 000 / 60) = 1 667 loads of 59 988.0 or 59 988.1 g (1e9 steps / 1667 = 599 880.02…).
    const result = ok(scaleBatch(DARK, { totalMassKg: 100_000, resolutionGrams: "0.1", machineCapacityKg: 60 }));
    expect(result.lines.map((l) => l.massGrams)).toEqual(["60000000", "10000000", "29500000", "500000"]);
    expect(result.loads).toHaveLength(1667);
    expect(new Set(result.loads.map((l) => l.massGrams))).toEqual(new Set(["59988.1", "59988"]));
  });

  it("gives a reason instead of a result for impossible requests", () => {
    expect(scaleBatch(DARK, { totalMassKg: 0, resolutionGrams: 1 })).toMatchObject({ ok: false });
    expect(scaleBatch(DARK, { totalMassKg: 10, resolutionGrams: -1 })).toMatchObject({ ok: false });
    expect(scaleBatch([{ percent: 0 }], { totalMassKg: 10, resolutionGrams: 1 })).toMatchObject({ ok: false });
    expect(scaleBatch(DARK, { totalMassKg: 100_000, resolutionGrams: 1, machineCapacityKg: "0.001" })).toMatchObject({ ok: false });
    expect(scaleBatch(DARK, { totalMassKg: 10, resolutionGrams: 1, machineCapacityKg: "0.0001" })).toMatchObject({ ok: false });
  });
});
