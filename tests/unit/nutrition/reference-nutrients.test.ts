import { describe, expect, it } from "vitest";
import { DEFAULT_INGREDIENTS, LABEL_NUTRIENT_PROFILES, computeNutrition, findLabelNutrients } from "@/lib/formulation";

const nutrients = (key: string) => {
  const found = findLabelNutrients(key);
  if (!found) throw new Error(`no label nutrients for ${key}`);
  return found;
};

describe("label nutrient profiles of the reference ingredients", () => {
  it("covers every reference ingredient, each with its sources", () => {
    expect(LABEL_NUTRIENT_PROFILES.map((p) => p.key)).toEqual(DEFAULT_INGREDIENTS.map((p) => p.key));
    for (const p of LABEL_NUTRIENT_PROFILES) expect(p.sources.length, p.key).toBeGreaterThan(0);
  });

  it("gives all seven label nutrients except for vanilla, which has no USDA entry", () => {
    for (const p of LABEL_NUTRIENT_PROFILES) {
      const count = Object.keys(p.nutrients).length;
      expect(count, p.key).toBe(p.key === "vanilla" ? 0 : 7);
    }
  });

  it("derives nibs from FDC 167568 scaled to 55 % fat and 2 % moisture", () => {
    // Non-fat dry part: nibs 100 − 55 − 2 = 43; FDC 167568 100 − 52.31 − 1.34 = 46.35 (REFERENCE.md §3).
    // protein 14.32 × 43 / 46.35 = 13.2850… → 13.29; carbohydrate 28.35 × 43 / 46.35 = 26.3009… → 26.3;
    // fibre 16.6 × 43 / 46.35 = 15.4002… → 15.4; sugars 0.91 × 43 / 46.35 = 0.8442… → 0.84;
    // sodium 24 mg (from memory) × 43 / 46.35 = 22.265 mg → salt × 2.5 = 0.05566 g → 0.0557;
    // saturates 55 × 0.597 (FDC 171421: 59.7 g per 100 g cocoa fat) = 32.835 → 32.84.
    expect(nutrients("cocoa-nibs").nutrients).toEqual({
      fat: "55", saturates: "32.84", protein: "13.29", carbohydrateByDifference: "26.3", fibre: "15.4", sugars: "0.84", salt: "0.0557",
    });
  });

  it("turns sodium into salt × 2.5 (Regulation (EU) No 1169/2011 Annex I point 11)", () => {
    // Whole milk powder FDC 173454, sodium 371 mg (from memory) → 927.5 mg salt = 0.9275 g.
    expect(nutrients("whole-milk-powder").nutrients.salt).toBe("0.9275");
    // Skim milk powder FDC 170877, sodium 535 mg (from memory) → 1.3375 g.
    expect(nutrients("skim-milk-powder").nutrients.salt).toBe("1.3375");
  });
});

describe("cross-check against USDA FoodData Central", () => {
  it("returns FDC 173454 (Milk, dry, whole) per 100 g for a product that is only whole milk powder", () => {
    // USDA FDC 173454, SR Legacy (REFERENCE.md §3, secondary): fat 26.71, protein 26.32,
    // carbohydrate 38.42, sugars 38.42, fibre 0.
    const { per100g } = computeNutrition([{ name: "Whole milk powder", percent: 100, nutrients: nutrients("whole-milk-powder").nutrients }]);
    expect([per100g.fat, per100g.protein, per100g.carbohydrateByDifference, per100g.sugars, per100g.fibre]).toEqual(["26.71", "26.32", "38.42", "38.42", "0"]);
    // 4 × 26.32 + 4 × 38.42 + 9 × 26.71 = 105.28 + 153.68 + 240.39 = 499.35 kcal with the general
    // factors; FDC lists 496 kcal (from memory), computed with the specific factors for milk —
    // within 1 %.
    expect(per100g.usEnergyKcal).toBe("499.35");
    expect(Math.abs(Number(per100g.usEnergyKcal) - 496) / 496).toBeLessThan(0.01);
  });

  it("gives cocoa butter 900 kcal with 9 kcal/g against FDC 171421's 884 kcal", () => {
    // FDC 171421 (Oil, cocoa butter) lists 884 kcal (from memory: 8.84 kcal/g, the specific factor for fats).
    const { per100g } = computeNutrition([{ name: "Cocoa butter", percent: 100, nutrients: nutrients("cocoa-butter").nutrients }]);
    expect([per100g.energyKcal, per100g.energyKj, per100g.saturates]).toEqual(["900", "3700", "59.7"]);
    expect(Math.abs(900 - 884) / 884).toBeLessThan(0.02);
  });
});
