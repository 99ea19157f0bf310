import { describe, expect, it } from "vitest";
import { EU_ENERGY_FACTORS, US_GENERAL_FACTORS, computeNutrition, nutritionForPortion, roundUsCalories, roundUsFat } from "@/lib/formulation";

// Regulation (EU) No 1169/2011 Annex XIV (primary): per gram, fat 37 kJ / 9 kcal, carbohydrate
// (available: total less fibre) 17 / 4, protein 17 / 4, fibre 8 / 2.
// 21 CFR 101.9(c)(1)(i)(B) (primary): 4 / 4 / 9 kcal per gram of protein, total carbohydrate
// (fibre included) and fat, applied to unrounded amounts.

const only = (nutrients: Record<string, string>) => computeNutrition([{ name: "test", percent: 100, nutrients: { fat: "0", saturates: "0", carbohydrateByDifference: "0", sugars: "0", fibre: "0", protein: "0", salt: "0", ...nutrients } }]).per100g;

describe("energy from each factor", () => {
  it("has the regulations' factors", () => {
    expect(EU_ENERGY_FACTORS).toMatchObject({ fat: { kj: "37", kcal: "9" }, carbohydrate: { kj: "17", kcal: "4" }, protein: { kj: "17", kcal: "4" }, fibre: { kj: "8", kcal: "2" } });
    expect([US_GENERAL_FACTORS.protein, US_GENERAL_FACTORS.carbohydrate, US_GENERAL_FACTORS.fat]).toEqual(["4", "4", "9"]);
  });

  it.each([
    // [nutrients per 100 g, kJ, kcal (EU), kcal (US)]
    [{ fat: "100" }, "3700", "900", "900"], // 100 g × 37 / 9; US 100 × 9
    [{ carbohydrateByDifference: "100" }, "1700", "400", "400"], // available 100 g × 17 / 4; US 100 × 4
    [{ protein: "100" }, "1700", "400", "400"],
    // All fibre: available carbohydrate 0, fibre 100 g × 8 / 2; the US counts it as carbohydrate: 4 × 100.
    [{ carbohydrateByDifference: "100", fibre: "100" }, "800", "200", "400"],
  ])("gives %j → %s kJ, %s kcal, US %s kcal", (nutrients, kj, kcal, us) => {
    const per100g = only(nutrients);
    expect([per100g.energyKj, per100g.energyKcal, per100g.usEnergyKcal]).toEqual([kj, kcal, us]);
  });

  it("computes US calories from unrounded amounts, not from the declared ones", () => {
    // 0.4 g each of fat, protein and carbohydrate per 25 g serving: 4 × 0.4 + 4 × 0.4 + 9 × 0.4 = 6.8 kcal
    // → 5 (nearest 5), though each amount is declared "0g" (< 0.5 g) and 0g × 9 + 0 + 0 would be 0.
    const per100g = only({ fat: "1.6", protein: "1.6", carbohydrateByDifference: "1.6" });
    const serving = nutritionForPortion(per100g, 25)!;
    expect(serving.usEnergyKcal).toBe("6.8");
    expect(roundUsCalories(serving.usEnergyKcal).text).toBe("5");
    expect(roundUsFat(serving.fat).text).toBe("0g");
  });

  it("gives no portion for a mass that is not above 0", () => {
    expect(nutritionForPortion(only({ fat: "1" }), 0)).toBeNull();
    expect(nutritionForPortion(only({ fat: "1" }), "abc")).toBeNull();
  });
});

describe("computeNutrition input handling", () => {
  it("reads percents that do not sum to 100 as parts", () => {
    // 1 part cocoa butter (fat 100) to 3 parts sugar (fat 0): fat 25 g per 100 g.
    const result = computeNutrition([
      { name: "butter", percent: 1, nutrients: { fat: 100 } },
      { name: "sugar", percent: 3, nutrients: { fat: 0 } },
    ]);
    expect(result.per100g.fat).toBe("25");
  });

  it("lists the lines that lack a nutrient and ignores lines of 0 %", () => {
    const result = computeNutrition([
      { name: "Vanilla (ground pods)", percent: "0.1", nutrients: {} },
      { name: "Sugar", percent: "99.9", nutrients: { fat: 0, saturates: 0, carbohydrateByDifference: "99.98", sugars: "99.91", fibre: 0, protein: 0, salt: "0.0025" } },
      { name: "Unused", percent: 0, nutrients: {} },
    ]);
    expect(result.missing.map((m) => m.nutrient)).toEqual(["fat", "saturates", "carbohydrateByDifference", "sugars", "fibre", "protein", "salt"]);
    expect(result.missing.every((m) => m.lines.length === 1 && m.lines[0] === "Vanilla (ground pods)")).toBe(true);
  });

  it("counts a bad figure as 0 with a warning instead of throwing", () => {
    const result = computeNutrition([{ name: "Odd", percent: "x", nutrients: { fat: "-3" } }, { name: "Fat", percent: 100, nutrients: { fat: "lots" } }]);
    expect(result.per100g.fat).toBe("0");
    expect(result.warnings).toEqual([
      'Odd: percent "x" is not a number of at least 0; counted as 0 %.',
      'Fat: fat "lots" is not a number of at least 0; counted as 0 g.',
    ]);
  });
});
