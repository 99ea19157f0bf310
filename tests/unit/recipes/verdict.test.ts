import { describe, expect, it } from "vitest";
import { evaluateRecipe, type RecipeLine } from "@/lib/formulation";
import { verdict } from "@/lib/recipes/verdict";

// Profiles as in REFERENCE.md §3: nibs ≈ 55 % cocoa butter, 2 % water (common practice);
// whole milk powder FDC 173454 (26.71 % fat, 2.47 % water).
const nibs = { name: "Nibs", cocoaButter: "55", cocoaSolidsNonFat: "43", moisture: "2" };
const butter = { name: "Cocoa butter", cocoaButter: "100" };
const milk = { name: "Whole milk powder", milkFat: "26.71", milkSolidsNonFat: "70.82", moisture: "2.47" };
const sugar = { name: "Sugar", sugar: "100" };

const eu = (lines: RecipeLine[], category: string) =>
  evaluateRecipe({ lines }, { authorities: ["EU"] }).standards.find((s) => s.category === category)!;

describe("verdict", () => {
  it("says meets for a 70 % dark bar in the EU's chocolate category (Directive 2000/36/EC Annex I A.3: ≥ 35 % total dry cocoa solids)", () => {
    const dark = [
      { ingredient: nibs, percent: "65" },
      { ingredient: butter, percent: "5" },
      { ingredient: sugar, percent: "30" },
    ];
    expect(verdict(eu(dark, "chocolate"))).toBe("meets");
  });

  it("names the gap of a failing limit: 12 % whole milk powder gives 11.70 % dry milk solids, short of 14 %, and 3.21 % milk fat, short of 3.5 % (Annex I A.4(a))", () => {
    const thinMilk = [
      { ingredient: nibs, percent: "30" },
      { ingredient: butter, percent: "12" },
      { ingredient: milk, percent: "12" },
      { ingredient: sugar, percent: "46" },
    ];
    // 14 − 12 × 0.9753 = 2.2964 → "2.3 %"; milk fat 12 × 0.2671 = 3.21 % is also short of 3.5 % (A.4(a)): one more.
    expect(verdict(eu(thinMilk, "milk chocolate"))).toBe("short by 2.3 % · 1 more");
  });

  it("adds how many more limits fail: sugar alone misses every cocoa minimum of EU chocolate (Annex I A.3)", () => {
    const words = verdict(eu([{ ingredient: sugar, percent: "100" }], "chocolate"));
    expect(words).toMatch(/^short by 35\.0 % · \d+ more$/);
  });
});
