import { describe, expect, it } from "vitest";
import { evaluateRecipe, type RecipeLine } from "@/lib/formulation";
import { suggestFix } from "@/lib/recipes/fix-suggestions";

// Profiles as in REFERENCE.md §3: nibs ≈ 55 % cocoa butter, 2 % water (common practice);
// whole milk powder FDC 173454 (26.71 % fat, 2.47 % water).
const nibs = { name: "Nibs", cocoaButter: "55", cocoaSolidsNonFat: "43", moisture: "2" };
const butter = { name: "Cocoa butter", cocoaButter: "100" };
const milk = { name: "Whole milk powder", milkFat: "26.71", milkSolidsNonFat: "70.82", moisture: "2.47" };
const sugar = { name: "Sugar", sugar: "100" };

/** A milk chocolate with too little milk for the EU's 14 % dry milk solids (Directive 2000/36/EC Annex I A.4(a)). */
const thinMilk: RecipeLine[] = [
  { ingredient: nibs, percent: "30" },
  { ingredient: butter, percent: "12" },
  { ingredient: milk, percent: "12" },
  { ingredient: sugar, percent: "46" },
];

const euMilk = (lines: RecipeLine[]) => evaluateRecipe({ lines }, { authorities: ["EU"] }).standards.find((s) => s.category === "milk chocolate")!;

describe("suggestFix", () => {
  it("finds the smallest two-line change that meets a failing category, and the change really meets it", () => {
    const before = euMilk(thinMilk);
    expect(before.pass).toBe(false);
    // 12 × 0.9753 = 11.70 % dry milk solids: short by 2.3 %.
    expect(before.checks.find((c) => c.quantity === "dryMilkSolids")!.shortBy).toBe("2.2964");
    const outcome = suggestFix(thinMilk, before);
    expect(outcome.ok).toBe(true);
    if (!outcome.ok) return;
    // Sugar gives way rather than nibs or butter: the same size of change, but the cocoa figure stays put.
    expect(outcome.fix).toMatchObject({ adjustIndex: 2, balanceIndex: 3, from: "12", categoryPasses: true });
    // 14 / 0.9753 = 14.355 %: the first 0.1 % step at or above it is 14.4 %.
    expect(outcome.fix.to).toBe("14.4");
    const after = thinMilk.map((l, i) => ({ ...l, percent: outcome.fix.percents[i]! }));
    expect(euMilk(after).pass).toBe(true);
    expect(outcome.fix.percents.reduce((s, p) => s + Number(p), 0)).toBeCloseTo(100, 9);
  });

  it("never moves a locked line", () => {
    const outcome = suggestFix(thinMilk, euMilk(thinMilk), { locked: [false, false, false, true] });
    expect(outcome.ok).toBe(true);
    if (outcome.ok) {
      expect(outcome.fix.percents[3]).toBe("46");
      expect(outcome.fix.adjustIndex).toBe(2);
    }
  });

  it("says so when no change of unlocked lines can meet it", () => {
    const outcome = suggestFix(thinMilk, euMilk(thinMilk), { locked: [true, true, true, false] });
    expect(outcome).toEqual({ ok: false, reason: expect.stringMatching(/No change of two unlocked lines meets it/) });
  });
});
