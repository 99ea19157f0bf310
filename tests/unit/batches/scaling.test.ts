import Decimal from "decimal.js";
import { describe, expect, it } from "vitest";
import { batchMassKg } from "@/lib/batches/batch-mass";
import { groupLoads, rangeLabel } from "@/lib/batches/group-loads";
import { precisionWarnings } from "@/lib/batches/precision";
import { sheetLoads } from "@/lib/batches/sheet";
import { scaleBatch } from "@/lib/formulation";

// Our 70 % dark starting point (lib/recipes/starting-points.ts): nibs, cocoa butter, sugar, lecithin.
const dark = [
  { id: "n", position: 1, ingredientName: "Cocoa nibs", ingredientKind: "nibs" as const, percent: "64", allergens: [] },
  { id: "b", position: 2, ingredientName: "Cocoa butter", ingredientKind: "cocoa_butter" as const, percent: "7.3", allergens: [] },
  { id: "s", position: 3, ingredientName: "Sugar", ingredientKind: "sugar" as const, percent: "28.4", allergens: [] },
  { id: "l", position: 4, ingredientName: "Soy lecithin", ingredientKind: "lecithin" as const, percent: "0.3", allergens: ["soybeans"] },
];

function scale(totalMassKg: string, resolutionGrams: string, machineCapacityKg?: string) {
  const r = scaleBatch(dark, { totalMassKg, resolutionGrams, machineCapacityKg });
  if (!r.ok) throw new Error(r.reason);
  return r;
}

const sum = (xs: string[]) => xs.reduce((s, x) => s.plus(x), new Decimal(0)).toFixed();

/** Every load sums to its mass, every line's loads to the line, everything to the batch. */
function expectExact(r: ReturnType<typeof scale>) {
  expect(sum(r.lines.map((l) => l.massGrams))).toBe(r.totalMassGrams);
  expect(sum(r.loads.map((l) => l.massGrams))).toBe(r.totalMassGrams);
  for (const load of r.loads) expect(sum(load.lineMassesGrams)).toBe(load.massGrams);
  r.lines.forEach((line, i) => expect(sum(r.loads.map((l) => l.lineMassesGrams[i]!))).toBe(line.massGrams));
}

describe("batch scaling for the batch sheet", () => {
  it("scales 1 kg on a 1 g bench scale to the exact shares", () => {
    const r = scale(batchMassKg("1", "kg", "70"), "1");
    expect(r.lines.map((l) => l.massGrams)).toEqual(["640", "73", "284", "3"]); // 64 %, 7.3 %, 28.4 %, 0.3 % of 1000 g
    expect(r.loads).toHaveLength(1);
    expectExact(r);
    expect(precisionWarnings(r.lines.map((l) => ({ ...l, name: l.ingredientName })), r.totalMassGrams, "1")).toEqual([]);
  });

  it("warns when a 1 kg batch is planned on a 100 g floor scale", () => {
    const r = scale("1", "100");
    expect(r.lines.map((l) => l.massGrams)).toEqual(["600", "100", "300", "0"]);
    expectExact(r);
    const warnings = precisionWarnings(r.lines.map((l) => ({ ...l, name: l.ingredientName })), r.totalMassGrams, "100");
    expect(warnings).toContain("Soy lecithin rounds to 0 g at a 100 g step (exactly 3 g). Weigh it on a finer scale.");
    expect(warnings).toContain("Cocoa nibs: 600 g instead of 640 g (−6.3 %) at a 100 g step. Choose a finer scale.");
  });

  it("scales 0.5 t at 100 g resolution without any rounding", () => {
    const r = scale(batchMassKg("0.5", "t", "70"), "100");
    expect(r.totalMassGrams).toBe("500000");
    // 5,000 steps of 100 g: 3,200 / 365 / 1,420 / 15 steps.
    expect(r.lines.map((l) => l.massGrams)).toEqual(["320000", "36500", "142000", "1500"]);
    expectExact(r);
  });

  it("scales 100 t into 1,667 loads of a 60 kg refiner, differing by one 100 g step", () => {
    const r = scale(batchMassKg("100", "t", "70"), "100", "60");
    expect(r.lines.map((l) => l.massGrams)).toEqual(["64000000", "7300000", "28400000", "300000"]);
    // ceil(100,000 / 60) = 1,667 loads; 1,000,000 steps = 1,467 × 600 + 200 × 599.
    expect(r.loads).toHaveLength(1667);
    expect(r.loads.filter((l) => l.massGrams === "60000")).toHaveLength(1467);
    expect(r.loads.filter((l) => l.massGrams === "59900")).toHaveLength(200);
    expectExact(r);
  });

  it("splits 25 kg on a 10 kg stone refiner into three near-equal loads", () => {
    const r = scale("25", "1", "10");
    // 25,000 g ÷ 3 = 8,333 r 1: the first load takes the extra gram.
    expect(r.loads.map((l) => l.massGrams)).toEqual(["8334", "8333", "8333"]);
    expectExact(r);
    const loads = sheetLoads({ resolutionGrams: "1", stationCapacityKg: "15", loads: r.loads, lines: dark });
    expect(loads.map((l) => l.lines.map((x) => x.ingredientName))).toEqual(Array(3).fill(["Cocoa nibs", "Cocoa butter", "Sugar", "Soy lecithin"]));
    expect(loads[0]!.lines.map((l) => l.massGrams)).toEqual(r.loads[0]!.lineMassesGrams);
  });

  it("turns a number of bars into the batch mass by the version's bar mass", () => {
    expect(batchMassKg("1000", "bars", "70")).toBe("70"); // 1,000 × 70 g
    expect(batchMassKg("250", "g", "70")).toBe("0.25");
    expect(batchMassKg("2", "t", "70")).toBe("2000");
  });

  it("flags a load line heavier than the weighing station takes", () => {
    const r = scale("60", "1");
    const [load] = sheetLoads({ resolutionGrams: "1", stationCapacityKg: "15", loads: r.loads, lines: dark });
    expect(load!.lines.filter((l) => l.overScale).map((l) => l.ingredientName)).toEqual(["Cocoa nibs", "Sugar"]); // 38.4 kg and 17.04 kg > 15 kg
  });
});

describe("grouping loads of a big batch", () => {
  it("prints 100 t on a 60 kg refiner as a few compositions covering all 1,667 loads", () => {
    const r = scale("100000", "100", "60");
    const groups = groupLoads(sheetLoads({ resolutionGrams: "100", stationCapacityKg: null, loads: r.loads, lines: dark }));
    expect(groups.length).toBeLessThan(10);
    expect(groups.flatMap((g) => g.loadNos).sort((a, b) => a - b)).toEqual(Array.from({ length: 1667 }, (_, i) => i + 1));
    for (const g of groups) for (const n of g.loadNos) expect(r.loads[n - 1]!.lineMassesGrams).toEqual(g.load.lines.map((l) => l.massGrams));
    expect(rangeLabel([1, 2, 3, 5, 7, 8])).toBe("1–3, 5, 7–8");
  });
});
