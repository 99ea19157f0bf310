import { describe, expect, it } from "vitest";
import { percentDailyValue, roundUsCalories, roundUsFat, roundUsGrams, roundUsSodium } from "@/lib/formulation";

// FDA Food Labeling Guide, Appendix H (rounding rules of 21 CFR 101.9(c)), primary per
// REFERENCE.md §4. Ties round up (the rules do not say: common practice, no single source).

describe("roundUsCalories — 21 CFR 101.9(c)(1)", () => {
  it.each([
    ["4.99", "0"], // < 5 cal: 0
    ["5", "5"], // 5–50: nearest 5
    ["5.01", "5"],
    ["7.49", "5"],
    ["7.5", "10"],
    ["49.9", "50"],
    ["50", "50"], // ≤ 50: still nearest 5
    ["50.01", "50"], // > 50: nearest 10
    ["54.99", "50"],
    ["55", "60"],
  ])("declares %s kcal as %s", (kcal, expected) => {
    expect(roundUsCalories(kcal).text).toBe(expected);
  });
});

describe("roundUsFat — total and saturated fat, 21 CFR 101.9(c)(2)", () => {
  it.each([
    ["0.49", "0g"], // < 0.5 g: 0
    ["0.5", "0.5g"], // < 5 g: nearest 0.5 g
    ["0.51", "0.5g"],
    ["0.75", "1g"],
    ["4.74", "4.5g"],
    ["4.99", "5g"], // just under 5 g: nearest 0.5 g is 5
    ["5", "5g"], // ≥ 5 g: nearest 1 g
    ["5.01", "5g"],
    ["5.5", "6g"],
  ])("declares %s g as %s", (grams, expected) => {
    expect(roundUsFat(grams).text).toBe(expected);
  });
});

describe("roundUsGrams — carbohydrate, fiber, sugars, added sugars, protein, 21 CFR 101.9(c)(6)–(7)", () => {
  it.each([
    ["0.49", "0g"], // < 0.5 g: 0
    ["0.5", "less than 1g"], // 0.5 to < 1 g
    ["0.99", "less than 1g"],
    ["1", "1g"], // ≥ 1 g: nearest 1 g
    ["1.49", "1g"],
    ["1.5", "2g"],
  ])("declares %s g as %s", (grams, expected) => {
    expect(roundUsGrams(grams).text).toBe(expected);
  });
});

describe("roundUsSodium — 21 CFR 101.9(c)(4)", () => {
  it.each([
    ["4.99", "0mg"], // < 5 mg: 0
    ["5", "5mg"], // 5–140 mg: nearest 5 mg
    ["7.5", "10mg"],
    ["139.9", "140mg"],
    ["140", "140mg"],
    ["140.01", "140mg"], // > 140 mg: nearest 10 mg
    ["144.99", "140mg"],
    ["145", "150mg"],
  ])("declares %s mg as %s", (mg, expected) => {
    expect(roundUsSodium(mg).text).toBe(expected);
  });
});

describe("percentDailyValue — 21 CFR 101.9(d)(7)(ii), from memory", () => {
  it("works from the declared amount so a declared 0 g reads 0 %", () => {
    // 0.4 g fat is declared 0 g; from the actual amount it would be 0.4 / 78 = 0.5 % → 1 %.
    expect(percentDailyValue(roundUsFat("0.4"), "0.4", "78")).toBe("0%");
    // 14 g / 78 g = 17.9 % → 18 % (daily value 78 g, 101.9(c)(9), from memory).
    expect(percentDailyValue(roundUsFat("14.4"), "14.4", "78")).toBe("18%");
  });

  it("works from the actual amount when the declaration is 'less than 1g'", () => {
    // 0.7 g fibre / 28 g = 2.5 % → 3 %.
    expect(percentDailyValue(roundUsGrams("0.7"), "0.7", "28")).toBe("3%");
  });
});
