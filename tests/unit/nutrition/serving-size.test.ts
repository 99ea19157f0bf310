import { describe, expect, it } from "vitest";
import { declareServingsPerContainer, usServingSize } from "@/lib/formulation";

// Reference amount for chocolate bars: 30 g, 21 CFR 101.12(b) Table 2 "all other candies"
// (REFERENCE.md §4, secondary). Serving rules of 21 CFR 101.9(b) (2016 rule), clause letters from memory.

const serve = (input: Parameters<typeof usServingSize>[0]) => {
  const result = usServingSize(input);
  if (!result.ok) throw new Error(result.reason);
  return [result.kind, `${result.householdMeasure} (${result.servingGrams}g)`, result.servingsPerContainer];
};

describe("usServingSize package size bands", () => {
  it.each([
    // 101.9(b)(6): under 200 % of 30 g (60 g) the package is one serving.
    ["45", ["single-serving", "1 bar (45g)", "1"]],
    ["59.9", ["single-serving", "1 bar (60g)", "1"]],
    // 101.9(b)(12)(i): 200 % to 300 % (60–90 g) inclusive, a second column for the package.
    ["60", ["dual-column", "1/2 bar (30g)", "2"]],
    ["90", ["dual-column", "1/3 bar (30g)", "3"]],
    // Over 300 %: one column per serving.
    ["90.1", ["multiple-servings", "1/3 bar (30g)", "3"]],
  ])("serves a %s g bar as %j", (grams, expected) => {
    expect(serve({ packageGrams: grams })).toEqual(expected);
  });
});

describe("usServingSize for a bar divided for eating — 101.9(b)(2)(ii)", () => {
  it("takes the allowed fraction closest to 30 g", () => {
    // 200 g: 1/6 = 33.3 g (3.3 off) beats 1/8 = 25 g (5 off); 1/7 is not an allowed fraction.
    expect(serve({ packageGrams: 200 })).toEqual(["multiple-servings", "1/6 bar (33g)", "6"]);
    // 250 g: 1/8 = 31.25 g (1.25 off) beats 1/9 = 27.8 g (2.2 off); declared 31 g.
    expect(serve({ packageGrams: 250 })).toEqual(["multiple-servings", "1/8 bar (31g)", "8"]);
  });
});

describe("usServingSize for a bar moulded in pieces — 101.9(b)(2)(i)", () => {
  it("counts whole pieces closest to 30 g when a piece is at most 50 % of it", () => {
    // 75 g in 12 pieces of 6.25 g: 5 pieces = 31.25 g (1.25 off) beat 4 = 25 g; 12 / 5 = 2.4
    // servings → nearest 0.5 between 2 and 5 → "about 2.5" (101.9(b)(8)(i)).
    expect(serve({ packageGrams: 75, piecesPerPackage: 12 })).toEqual(["dual-column", "5 pieces (31g)", "about 2.5"]);
    // 100 g in 10 pieces of 10 g: 3 pieces = 30 g; 10 / 3 = 3.33 → "about 3.5".
    expect(serve({ packageGrams: 100, piecesPerPackage: 10 })).toEqual(["multiple-servings", "3 pieces (30g)", "about 3.5"]);
  });

  it("takes the smaller count on a tie (our choice: the rule does not say)", () => {
    // 120 g in 10 pieces of 12 g: 2 pieces = 24 g and 3 = 36 g are both 6 g off.
    expect(serve({ packageGrams: 120, piecesPerPackage: 10 })).toEqual(["multiple-servings", "2 pieces (24g)", "5"]);
  });

  it("makes one piece the serving when a piece is over 50 % of 30 g", () => {
    // 100 g in 4 pieces of 25 g (83 %): one piece (101.9(b)(2)(i)(C), from memory).
    expect(serve({ packageGrams: 100, piecesPerPackage: 4 })).toEqual(["multiple-servings", "1 piece (25g)", "4"]);
  });
});

describe("declareServingsPerContainer — 101.9(b)(8)(i), from memory", () => {
  it.each([
    ["1.6", "about 2"],
    ["2", "2"],
    ["2.24", "about 2"],
    ["2.25", "about 2.5"],
    ["4.75", "about 5"],
    ["5.2", "about 5"],
    ["5.5", "about 6"],
    ["7", "7"],
  ])("declares %s servings as %s", (servings, expected) => {
    expect(declareServingsPerContainer(servings)).toBe(expected);
  });
});

describe("usServingSize bad input", () => {
  it("refuses a bar mass or piece count it cannot use, with a reason", () => {
    expect(usServingSize({ packageGrams: 0 })).toEqual({ ok: false, reason: "The bar mass 0 must be a number above 0 g." });
    expect(usServingSize({ packageGrams: "a lot" })).toMatchObject({ ok: false });
    expect(usServingSize({ packageGrams: 100, piecesPerPackage: 2.5 })).toEqual({ ok: false, reason: "The number of pieces 2.5 must be a whole number from 1 to 500." });
  });
});
