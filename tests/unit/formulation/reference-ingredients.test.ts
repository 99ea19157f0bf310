import { describe, expect, it } from "vitest";
import { DEFAULT_INGREDIENTS, evaluateRecipe, findDefaultIngredient } from "@/lib/formulation";

const profile = (key: string) => {
  const found = findDefaultIngredient(key);
  if (found === undefined) throw new Error(`no profile ${key}`);
  return found;
};

describe("default ingredient profiles against USDA FoodData Central", () => {
  it("derives whole milk powder from FDC 173454 (Milk, dry, whole)", () => {
    // USDA FDC 173454, SR Legacy, per 100 g (REFERENCE.md §3, secondary): water 2.47, fat 26.71,
    // protein 26.32, carbohydrate 38.42 (all lactose: sugars 38.42), fibre 0, ash 6.08.
    const wmp = profile("whole-milk-powder");
    expect(wmp.nutrients).toEqual({ water: 2.47, fat: 26.71, protein: 26.32, carbohydrateByDifference: 38.42, fibre: 0, sugars: 38.42, ash: 6.08 });
    // Composition: milk fat = fat 26.71; moisture = water 2.47; non-fat milk solids = 100 − 26.71 − 2.47
    // = 70.82, which is also protein + lactose + ash = 26.32 + 38.42 + 6.08 = 70.82 (a USDA cross-check).
    expect([wmp.milkFat, wmp.moisture, wmp.milkSolidsNonFat]).toEqual(["26.71", "2.47", "70.82"]);
    expect(wmp.sources.join(" ")).toContain("FDC 173454");
  });

  it("derives skim milk powder from FDC 170877 (Milk, dry, nonfat)", () => {
    // USDA FDC 170877 (REFERENCE.md §3, from memory; protein secondary): water 3.16, fat 0.77,
    // protein 36.16, carbohydrate 51.98, ash 7.93 → non-fat milk solids 100 − 0.77 − 3.16 = 96.07
    // = 36.16 + 51.98 + 7.93.
    const smp = profile("skim-milk-powder");
    expect([smp.milkFat, smp.moisture, smp.milkSolidsNonFat]).toEqual(["0.77", "3.16", "96.07"]);
  });

  it("uses FDC 167568 (Baking chocolate, unsweetened) as the cocoa liquor proxy", () => {
    // USDA FDC 167568 (secondary): water 1.34, fat 52.31, protein 14.32, carbohydrate 28.35, ash 3.6.
    // Dry non-fat cocoa solids = 100 − 52.31 − 1.34 = 46.35; protein + carbohydrate + ash = 46.27,
    // the 0.08 gap being USDA's own rounding (its proximates add up to 99.92).
    const liquor = profile("cocoa-liquor");
    expect([liquor.cocoaButter, liquor.moisture, liquor.cocoaSolidsNonFat]).toEqual(["52.31", "1.34", "46.35"]);
    expect(liquor.sources.join(" ")).toContain("FDC 167568");
  });

  it("takes cocoa butter (FDC 171421) and sugar (FDC 169655) from USDA", () => {
    // FDC 171421: fat 100 g, saturates 59.7 g. FDC 169655: carbohydrate 99.98, sugars 99.91, water 0.02.
    expect(profile("cocoa-butter")).toMatchObject({ cocoaButter: 100, nutrients: { fat: 100, saturates: 59.7 } });
    expect(profile("sucrose")).toMatchObject({ sugar: 99.98, moisture: 0.02, nutrients: { sugars: 99.91 } });
  });

  it("uses common-practice nib figures: 55 % cocoa butter, 2 % moisture", () => {
    // REFERENCE.md §3: cocoa butter 50–57 % (≈ 55 typical), moisture 1.5–3 % (common practice, no single source).
    const nibs = profile("cocoa-nibs");
    expect([nibs.cocoaButter, nibs.moisture, nibs.cocoaSolidsNonFat]).toEqual(["55", "2", "43"]);
    expect(nibs.sources.join(" ")).toContain("common practice, no single source");
  });

  it("counts soy lecithin as other, not vegetable fat (Directive 2000/36/EC Art. 2(1) is about fats)", () => {
    const lecithin = profile("soy-lecithin");
    expect(lecithin.vegetableFat).toBeUndefined();
    const result = evaluateRecipe({ lines: [{ ingredient: lecithin, percent: 100 }] });
    expect([result.composition.vegetableFat, result.composition.other]).toEqual(["0", "100"]);
  });

  it("has the ten listed profiles, each sourced and within 100 g per 100 g", () => {
    expect(DEFAULT_INGREDIENTS.map((p) => p.key)).toEqual([
      "cocoa-nibs", "cocoa-liquor", "cocoa-butter", "cocoa-powder-10-12", "sucrose",
      "whole-milk-powder", "skim-milk-powder", "buttermilk-powder", "soy-lecithin", "vanilla",
    ]);
    for (const p of DEFAULT_INGREDIENTS) {
      expect(p.sources.length, p.key).toBeGreaterThan(0);
      expect(evaluateRecipe({ lines: [{ ingredient: p, percent: 100 }] }).warnings, p.key).toEqual([]);
    }
  });
});
