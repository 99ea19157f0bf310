import { describe, expect, it } from "vitest";
import { evaluateRecipe, summarizeStandards } from "@/lib/formulation";
import { COCOA_BUTTER, NIBS, SUGAR, WHOLE_MILK_POWDER, line } from "./fixtures";

// REFERENCE.md §2 worked example: 60 % nibs (55 % butter, 2 % water) + 10 % cocoa butter + 30 % sugar.
const DARK = [line(NIBS, 60), line(COCOA_BUTTER, 10), line(SUGAR, 30)];

describe("summarizeStandards (the evaluate API's brief standards)", () => {
  it("keeps every category's pass and lists exactly its failed checks, without their wording", () => {
    const full = evaluateRecipe({ lines: DARK }).standards;
    const brief = summarizeStandards(full);
    expect(brief.map((s) => `${s.authority} ${s.category} ${s.pass}`)).toEqual(full.map((s) => `${s.authority} ${s.category} ${s.pass}`));
    for (const [i, s] of brief.entries()) {
      const failed = full[i]!.checks.filter((c) => !c.pass);
      expect(s.failed.map((c) => `${c.basis} ${c.quantity}`)).toEqual(failed.map((c) => `${c.basis} ${c.quantity}`));
      expect(s.pass).toBe(s.failed.length === 0);
      for (const c of s.failed) expect(Object.keys(c)).not.toContain("label");
    }
  });

  it("gives the gap to a legal minimum", () => {
    const brief = summarizeStandards(evaluateRecipe({ lines: DARK }).standards);
    // Directive 2000/36/EC Annex I A.3(a): chocolate needs ≥ 35 % total dry cocoa solids — the dark bar (68.8 %) passes.
    expect(brief.find((s) => s.authority === "EU" && s.category === "chocolate")).toMatchObject({ pass: true, failed: [] });
    // Directive 2000/36/EC Annex I A.4(a): milk chocolate needs ≥ 14 % dry milk solids and ≥ 3.5 % milk fat; the bar has none.
    const milk = brief.find((s) => s.authority === "EU" && s.category === "milk chocolate")!;
    expect(milk.pass).toBe(false);
    expect(milk.failed).toEqual([
      { quantity: "dryMilkSolids", basis: "eu", actual: "0", minimum: "14", shortBy: "14" },
      { quantity: "milkFat", basis: "eu", actual: "0", minimum: "3.5", shortBy: "3.5" },
    ]);
  });

  it("gives the excess over a maximum, and marks a strict one", () => {
    // 21 CFR 163.123(a)(2): sweet chocolate has less than 12 % milk solids (a strict maximum).
    const milky = [line(NIBS, 30), line(COCOA_BUTTER, 10), line(WHOLE_MILK_POWDER, 25), line(SUGAR, 35)];
    const brief = summarizeStandards(evaluateRecipe({ lines: milky }, { authorities: ["US"] }).standards);
    const sweet = brief.find((s) => s.category === "sweet chocolate")!;
    // 25 % powder × (26 fat + 72 non-fat) = 24.5 % milk solids: 12.5 over the 12 % line.
    expect(sweet.failed).toContainEqual({ quantity: "dryMilkSolids", basis: "us", actual: "24.5", maximum: "12", exclusiveMaximum: true, overBy: "12.5" });
  });
});
