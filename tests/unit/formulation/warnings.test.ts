import { describe, expect, it } from "vitest";
import { evaluateRecipe, type Recipe } from "@/lib/formulation";
import { HAZELNUTS, NIBS, SUGAR, line } from "./fixtures";

const codes = (recipe: unknown, options?: unknown) =>
  evaluateRecipe(recipe as Recipe, options as never).warnings.map((w) => w.code);

describe("evaluateRecipe warnings", () => {
  it("reports a sum other than 100 and reads the lines as parts", () => {
    // 60 nibs + 30 sugar = 90 parts: cocoa butter 33 / 90 = 36.666…%.
    const result = evaluateRecipe({ lines: [line(NIBS, 60), line(SUGAR, 30)] });
    expect(result.warnings).toEqual([{ code: "sum-not-100", message: "The lines add up to 90 %, not 100 %; figures are shares of that total." }]);
    expect(result.composition.cocoaButter).toBe("36.66666666666666666666666666666667");
  });

  it("counts a negative or non-numeric percent as 0", () => {
    const result = evaluateRecipe({ lines: [line(NIBS, 100), line(SUGAR, -5), line(SUGAR, "abc")] });
    expect(result.warnings.map((w) => [w.code, w.lineIndex])).toEqual([["negative-percent", 1], ["invalid-percent", 2]]);
    expect(result.composition.sugar).toBe("0");
    for (const bad of [Number.NaN, Number.POSITIVE_INFINITY, null, "", "0x10", "1e999", {}]) {
      expect(codes({ lines: [line(NIBS, 100), { ingredient: SUGAR, percent: bad }] })).toEqual(["invalid-percent"]);
    }
  });

  it("reports an ingredient over 100 g per 100 g and bad composition fields", () => {
    expect(codes({ lines: [line({ name: "X", cocoaButter: 80, sugar: 30 }, 100)] })).toEqual(["composition-over-100"]);
    expect(codes({ lines: [line({ name: "X", cocoaButter: -1 }, 100)] })).toEqual(["negative-composition"]);
    expect(codes({ lines: [line({ name: "X", cocoaButter: "lots" as never }, 100)] })).toEqual(["invalid-composition"]);
  });

  it("warns above 40 % inclusions (Directive 2000/36/EC Annex I notes; Codex CXS 87-1981 section 2)", () => {
    expect(codes({ lines: [line(NIBS, 60), line(HAZELNUTS, 40)] })).toEqual([]);
    expect(codes({ lines: [line(NIBS, "59.9"), line(HAZELNUTS, "40.1")] })).toEqual(["inclusions-over-40"]);
    expect(codes({ lines: [line(HAZELNUTS, 100)] })).toEqual(["inclusions-over-40", "empty-base"]);
  });

  it("reports an empty recipe and never throws on garbage", () => {
    expect(codes({ lines: [] })).toEqual(["empty-recipe"]);
    expect(codes({ lines: [line(NIBS, 0)] })).toEqual(["empty-recipe"]);
    expect(codes(null)).toEqual(["invalid-recipe", "empty-recipe"]);
    expect(codes({ lines: "nope" })).toEqual(["invalid-recipe", "empty-recipe"]);
    expect(codes({ lines: [null, 5, { percent: 100 }] })).toEqual(["invalid-line", "invalid-line", "invalid-line"]);
  });

  it("checks only the chosen authorities and warns about unknown ones", () => {
    const result = evaluateRecipe({ lines: [line(NIBS, 100)] }, { authorities: ["EU", "XX" as never] });
    expect(new Set(result.standards.map((s) => s.authority))).toEqual(new Set(["EU"]));
    expect(result.warnings.map((w) => w.code)).toEqual(["invalid-option"]);
    expect(evaluateRecipe({ lines: [line(NIBS, 100)] }, { authorities: [] }).standards).toEqual([]);
  });
});
