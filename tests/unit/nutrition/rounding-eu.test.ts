import { describe, expect, it } from "vitest";
import { roundEuEnergy, roundEuMass } from "@/lib/formulation";

// European Commission, guidance document on tolerances and rounding for nutrition labelling
// (December 2012), section 4 — increments from memory (REFERENCE.md §4). Bands are chosen on
// the unrounded amount; "nearest" rounds half up. Each boundary is tried at, just under and just over.

const text = (grams: string, rule: Parameters<typeof roundEuMass>[1]) => roundEuMass(grams, rule).text;

describe("roundEuMass for fat, carbohydrate, sugars, protein and fibre", () => {
  it.each([
    ["0", "0 g"], // nothing at all
    ["0.49", "< 0.5 g"], // ≤ 0.5 g: "0 g" or "< 0.5 g" may be declared; we say "<"
    ["0.5", "< 0.5 g"], // at the boundary: still ≤ 0.5 g
    ["0.51", "0.5 g"], // > 0.5 g: nearest 0.1 g
    ["0.55", "0.6 g"], // a tie rounds up
    ["9.94", "9.9 g"],
    ["9.99", "10.0 g"], // just under 10 g: still the 0.1 g band
    ["10", "10 g"], // ≥ 10 g: nearest 1 g
    ["10.01", "10 g"],
    ["10.5", "11 g"],
  ])("declares %s g as %s", (grams, expected) => {
    expect(text(grams, "macronutrient")).toBe(expected);
  });
});

describe("roundEuMass for saturates", () => {
  it.each([
    ["0.09", "< 0.1 g"], // ≤ 0.1 g
    ["0.1", "< 0.1 g"],
    ["0.11", "0.1 g"], // > 0.1 g: nearest 0.1 g
    ["0.15", "0.2 g"],
    ["9.99", "10.0 g"],
    ["10", "10 g"], // ≥ 10 g: nearest 1 g
    ["10.01", "10 g"],
  ])("declares %s g as %s", (grams, expected) => {
    expect(text(grams, "saturates")).toBe(expected);
  });
});

describe("roundEuMass for salt", () => {
  it.each([
    ["0.0124", "< 0.01 g"], // ≤ 0.0125 g
    ["0.0125", "< 0.01 g"],
    ["0.0126", "0.01 g"], // > 0.0125 g: nearest 0.01 g
    ["0.245", "0.25 g"],
    ["0.999", "1.00 g"], // just under 1 g: still the 0.01 g band
    ["1", "1.0 g"], // ≥ 1 g: nearest 0.1 g
    ["1.01", "1.0 g"],
    ["1.05", "1.1 g"],
  ])("declares %s g as %s", (grams, expected) => {
    expect(text(grams, "salt")).toBe(expected);
  });
});

describe("roundEuEnergy", () => {
  it("rounds kJ and kcal to whole units, half up", () => {
    expect(roundEuEnergy("2374.49", "kJ")).toEqual({ text: "2374 kJ", value: "2374" });
    expect(roundEuEnergy("2374.5", "kJ")).toEqual({ text: "2375 kJ", value: "2375" });
    expect(roundEuEnergy("0.49", "kcal").text).toBe("0 kcal");
  });

  it("shows a dash for a figure that is not a number instead of throwing", () => {
    expect(roundEuEnergy("lots", "kJ")).toEqual({ text: "—", value: null });
    expect(roundEuMass("-1", "salt")).toEqual({ text: "—", value: null });
  });
});
