import { describe, expect, it } from "vitest";
import { solveForTarget } from "@/lib/formulation";
import { COCOA_BUTTER, HAZELNUTS, NIBS, SUGAR, WHOLE_MILK_POWDER, line } from "./fixtures";

// The reference dark: 60 nibs (55 % butter, 2 % water), 10 cocoa butter, 30 sugar → 68.8 % dry
// cocoa solids (REFERENCE.md §2 worked example).
const REF = [line(NIBS, 60), line(COCOA_BUTTER, 10), line(SUGAR, 30)];
const pct = (r: ReturnType<typeof solveForTarget>) => (r.ok ? r.lines.map((l) => l.percent) : r.reason);

describe("solveForTarget", () => {
  it("hits a target exactly when the answer is on the grid", () => {
    // Butter against sugar: 68.8 + x = 70 → butter 11.2, sugar 28.8 (EU Annex I total dry cocoa solids).
    const result = solveForTarget(REF, { quantity: "totalDryCocoaSolids", value: 70 }, 1, 2);
    expect(result).toMatchObject({ ok: true, achieved: "70", exact: true, exactPercent: "11.2" });
    expect(pct(result)).toEqual(["60", "11.2", "28.8"]);
  });

  it("rounds a minimum-type target up to the next grid step and reports what it reaches", () => {
    // Nibs against sugar: dry cocoa solids = 0.98 n + 10 = 70 → n = 61.2244…; on 0.1 % the step
    // that still meets 70 is 61.3 → 0.98 × 61.3 + 10 = 70.074.
    const result = solveForTarget(REF, { quantity: "totalDryCocoaSolids", value: 70 }, 0, 2);
    expect(result).toMatchObject({ ok: true, achieved: "70.074", exact: false });
    expect(pct(result)).toEqual(["61.3", "10", "28.7"]);
  });

  it("rounds a maximum-type target down", () => {
    // Sugar at most 29.95 % moving sugar against butter: sugar 29.95 → on 0.1 % grid 29.9.
    const result = solveForTarget(REF, { quantity: "sugar", value: "29.95" }, 2, 1);
    expect(result).toMatchObject({ ok: true, achieved: "29.9", exact: false });
  });

  it("solves on the Codex dry basis, where the base moves too", () => {
    // Dry matter stays 98.8 (butter and sugar hold no water): need 0.7 × 98.8 = 69.16 % dry cocoa
    // solids in the product → butter 10 + 0.36 = 10.36; exact on a 0.01 grid.
    const result = solveForTarget(REF, { quantity: "totalDryCocoaSolids", value: 70, basis: "codex" }, 1, 2, { resolution: "0.01" });
    expect(result).toMatchObject({ ok: true, achieved: "70", exact: true });
    expect(pct(result)).toEqual(["60", "10.36", "29.64"]);
  });

  it("solves on the EU basis when the inclusion line moves (ratio of linear terms)", () => {
    // 50 nibs, 30 sugar, 20 hazelnuts; move hazelnuts against sugar to reach 60 % dry cocoa solids
    // on the EU basis: 49 / (80 + 20 − h) … with nibs 49 % dry solids: 49 / (100 − h) = 0.6 →
    // h = 100 − 81.666… = 18.333…; a minimum: the next step up keeping ≥ 60 is h = 18.4, sugar
    // 50 − 18.4 = 31.6 → 49 / 81.6 = 60.049…%.
    const lines = [line(NIBS, 50), line(SUGAR, 30), line(HAZELNUTS, 20)];
    const result = solveForTarget(lines, { quantity: "totalDryCocoaSolids", value: 60, basis: "eu" }, 2, 1);
    expect(pct(result)).toEqual(["50", "31.6", "18.4"]);
    expect(result.ok && result.achieved.startsWith("60.0490196078431372549")).toBe(true);
  });

  it("says why it cannot", () => {
    const reason = (r: ReturnType<typeof solveForTarget>) => (r.ok ? "" : r.reason);
    // 99 % would need sugar below 0.
    expect(reason(solveForTarget(REF, { quantity: "totalDryCocoaSolids", value: 99 }, 1, 2))).toContain("below 0");
    // Butter and sugar hold no milk fat.
    expect(reason(solveForTarget(REF, { quantity: "milkFat", value: 3 }, 1, 2))).toContain("does not change");
    expect(reason(solveForTarget(REF, { quantity: "totalDryCocoaSolids", value: 70 }, 1, 2, { locked: [false, true] }))).toContain("locked");
    expect(reason(solveForTarget(REF, { quantity: "totalDryCocoaSolids", value: 70 }, 1, 1))).toContain("different");
    expect(reason(solveForTarget(REF, { quantity: "totalDryCocoaSolids", value: 70 }, 1, 7))).toContain("lines of the recipe");
    expect(reason(solveForTarget(REF, { quantity: "bogus" as never, value: 70 }, 1, 2))).toContain("not a composition quantity");
    // A milk fat of −1 % would need a negative amount of milk powder.
    const milk = [line(WHOLE_MILK_POWDER, 20), line(SUGAR, 80)];
    expect(reason(solveForTarget(milk, { quantity: "milkFat", value: -1 }, 0, 1))).toContain("below 0");
  });
});
