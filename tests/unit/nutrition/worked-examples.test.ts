import { describe, expect, it } from "vitest";
import {
  allergenSummary,
  buildIngredientStatement,
  computeNutrition,
  euNutritionDeclaration,
  evaluateRecipe,
  nutritionForPortion,
  solidsStatements,
  usNutritionPanel,
  usServingSize,
} from "@/lib/formulation";
import { DARK_70, MILK_45, engineLines, nutritionLines, statementLines } from "./fixtures";

// Ingredient figures per 100 g (lib/formulation/reference/label-nutrients.ts):
//   nibs (derived from USDA FDC 167568 scaled by 43 / 46.35): fat 55, saturates 32.84 (55 × 0.597,
//     FDC 171421's share), carbohydrate 26.3, fibre 15.4, sugars 0.84, protein 13.29, salt 0.0557;
//   cocoa butter FDC 171421: fat 100, saturates 59.7; sugar FDC 169655: carbohydrate 99.98,
//     sugars 99.91 (all added), salt 0.0025; soy lecithin SR 04531: fat 100, saturates 15.01;
//   whole milk powder FDC 173454: fat 26.71, saturates 16.74, carbohydrate 38.42 = sugars,
//     protein 26.32, salt 0.9275 (sodium 371 mg × 2.5, from memory).
// Energy: Regulation (EU) No 1169/2011 Annex XIV — fat 37 kJ / 9 kcal, available carbohydrate
// 17 / 4, protein 17 / 4, fibre 8 / 2 per g. US: 21 CFR 101.9(c)(1)(i)(B) — 4 / 4 / 9 kcal per g
// of protein, total carbohydrate, fat, on unrounded amounts.

describe("nutrition of the 70 % dark (65 nibs, 5 cocoa butter, 29.5 sugar, 0.5 lecithin)", () => {
  const { per100g, missing, warnings } = computeNutrition(nutritionLines(DARK_70));

  it("computes every amount per 100 g exactly", () => {
    // fat 0.65 × 55 + 0.05 × 100 + 0.005 × 100 = 35.75 + 5 + 0.5 = 41.25
    // saturates 0.65 × 32.84 + 0.05 × 59.7 + 0.005 × 15.01 = 21.346 + 2.985 + 0.07505 = 24.40605
    // carbohydrate by difference 0.65 × 26.3 + 0.295 × 99.98 = 17.095 + 29.4941 = 46.5891
    // fibre 0.65 × 15.4 = 10.01 → available carbohydrate 46.5891 − 10.01 = 36.5791
    // sugars 0.65 × 0.84 + 0.295 × 99.91 = 0.546 + 29.47345 = 30.01945; added 0.295 × 99.91 = 29.47345
    // protein 0.65 × 13.29 = 8.6385; salt 0.65 × 0.0557 + 0.295 × 0.0025 = 0.036205 + 0.0007375 = 0.0369425
    // sodium 0.0369425 ÷ 2.5 × 1000 = 14.777 mg (Regulation (EU) No 1169/2011 Annex I point 11)
    // kJ 37 × 41.25 + 17 × 36.5791 + 17 × 8.6385 + 8 × 10.01 = 1526.25 + 621.8447 + 146.8545 + 80.08 = 2375.0292
    // kcal 9 × 41.25 + 4 × 36.5791 + 4 × 8.6385 + 2 × 10.01 = 371.25 + 146.3164 + 34.554 + 20.02 = 572.1404
    // US kcal 4 × 8.6385 + 4 × 46.5891 + 9 × 41.25 = 34.554 + 186.3564 + 371.25 = 592.1604
    expect(per100g).toEqual({
      fat: "41.25", saturates: "24.40605", carbohydrateByDifference: "46.5891", carbohydrateAvailable: "36.5791",
      sugars: "30.01945", addedSugars: "29.47345", fibre: "10.01", protein: "8.6385", salt: "0.0369425",
      sodiumMg: "14.777", energyKj: "2375.0292", energyKcal: "572.1404", usEnergyKcal: "592.1604",
    });
    expect(missing).toEqual([]);
    expect(warnings).toEqual([]);
  });

  it("rounds the EU table per 100 g and per 35 g portion with % reference intake", () => {
    // EC guidance (Dec 2012) §4, from memory: energy to 1 kJ / 1 kcal; ≥ 10 g to 1 g; 0.5–10 g to
    // 0.1 g; saturates the same above 0.1 g; salt 0.0125–1 g to 0.01 g.
    // Per 35 g: kJ 831.26022, kcal 200.24914, fat 14.4375, saturates 8.5421175, carbohydrate
    // 12.802685, sugars 10.5068075, fibre 3.5035, protein 3.023475, salt 0.012929875.
    // % RI (Regulation (EU) No 1169/2011 Annex XIII Part B, from memory): 831.26022 / 8400 = 9.9 → 10;
    // 14.4375 / 70 = 20.6 → 21; 8.542 / 20 = 42.7 → 43; 12.80 / 260 = 4.9 → 5; 10.51 / 90 = 11.7 → 12;
    // 3.02 / 50 = 6.0 → 6; 0.0129 / 6 = 0.2 → 0.
    const portion = nutritionForPortion(per100g, 35)!;
    expect(euNutritionDeclaration(per100g, portion)).toEqual([
      { key: "energy", label: "Energy", sub: false, per100g: "2375 kJ / 572 kcal", perPortion: "831 kJ / 200 kcal", referenceIntakePercent: "10" },
      { key: "fat", label: "Fat", sub: false, per100g: "41 g", perPortion: "14 g", referenceIntakePercent: "21" },
      { key: "saturates", label: "of which saturates", sub: true, per100g: "24 g", perPortion: "8.5 g", referenceIntakePercent: "43" },
      { key: "carbohydrate", label: "Carbohydrate", sub: false, per100g: "37 g", perPortion: "13 g", referenceIntakePercent: "5" },
      { key: "sugars", label: "of which sugars", sub: true, per100g: "30 g", perPortion: "11 g", referenceIntakePercent: "12" },
      { key: "fibre", label: "Fibre", sub: false, per100g: "10 g", perPortion: "3.5 g" },
      { key: "protein", label: "Protein", sub: false, per100g: "8.6 g", perPortion: "3.0 g", referenceIntakePercent: "6" },
      { key: "salt", label: "Salt", sub: false, per100g: "0.04 g", perPortion: "0.01 g", referenceIntakePercent: "0" },
    ]);
  });

  it("lays out a 70 g bar's US panel: half a bar per serving, two columns", () => {
    // 70 g = 233 % of the 30 g reference amount (21 CFR 101.12(b)): dual columns (101.9(b)(12)(i));
    // halves (35 g, 5 g off) beat thirds (23.3 g, 6.7 g off): 1/2 bar, 2 servings (101.9(b)(2)(ii)).
    // Per 35 g: kcal 4 × 3.023475 + 4 × 16.306185 + 9 × 14.4375 = 207.25614 → 210 (> 50: nearest 10);
    // fat 14.4375 → 14 g, 14 / 78 = 17.9 → 18 %; saturates 8.5421175 (≥ 5 g: nearest 1 g) → 9 g, 45 %;
    // sodium 5.17195 mg → 5 mg (5–140: nearest 5), 5 / 2300 → 0 %; carbohydrate 16.306 → 16 g,
    // 16 / 275 = 5.8 → 6 %; fibre 3.5035 → 4 g, 4 / 28 = 14.3 → 14 %; sugars 10.507 → 11 g;
    // added 10.316 → 10 g, 10 / 50 = 20 %; protein 3.023 → 3 g (Appendix H; daily values 101.9(c)(9), memory).
    // Per 70 g: kcal 414.51228 → 410; fat 28.875 → 29 g, 37 %; saturates 17.08 → 17 g, 85 %;
    // sodium 10.3439 → 10 mg, 0 %; carbohydrate 32.61 → 33 g, 12 %; fibre 7.007 → 7 g, 25 %;
    // sugars 21.01 → 21 g; added 20.63 → 21 g, 42 %; protein 6.047 → 6 g.
    const serving = usServingSize({ packageGrams: "70" });
    if (!serving.ok) throw new Error(serving.reason);
    const panel = usNutritionPanel(per100g, serving);
    expect([panel.kind, panel.servingSize, panel.servingsPerContainer]).toEqual(["dual-column", "1/2 bar (35g)", "2"]);
    expect(panel.calories).toEqual({ perServing: "210", perPackage: "410" });
    const figures = Object.fromEntries(panel.rows.map((r) => [r.key, [r.perServing, r.perPackage]]));
    expect(figures).toEqual({
      fat: [{ amount: "14g", percentDailyValue: "18%" }, { amount: "29g", percentDailyValue: "37%" }],
      saturates: [{ amount: "9g", percentDailyValue: "45%" }, { amount: "17g", percentDailyValue: "85%" }],
      transFat: [undefined, undefined],
      cholesterol: [undefined, undefined],
      sodium: [{ amount: "5mg", percentDailyValue: "0%" }, { amount: "10mg", percentDailyValue: "0%" }],
      carbohydrate: [{ amount: "16g", percentDailyValue: "6%" }, { amount: "33g", percentDailyValue: "12%" }],
      fibre: [{ amount: "4g", percentDailyValue: "14%" }, { amount: "7g", percentDailyValue: "25%" }],
      sugars: [{ amount: "11g" }, { amount: "21g" }],
      addedSugars: [{ amount: "10g", percentDailyValue: "20%" }, { amount: "21g", percentDailyValue: "42%" }],
      protein: [{ amount: "3g" }, { amount: "6g" }],
      vitaminD: [undefined, undefined],
      calcium: [undefined, undefined],
      iron: [undefined, undefined],
      potassium: [undefined, undefined],
    });
    expect(panel.notComputed).toEqual(["Trans Fat", "Cholesterol", "Vitamin D", "Calcium", "Iron", "Potassium"]);
  });

  it("lists ingredients heaviest first with soya emphasised, and states 68 % cocoa solids", () => {
    // Regulation (EU) No 1169/2011 Art. 18(1) (descending weight) and Art. 21(1)(b) (allergen emphasis).
    const statement = buildIngredientStatement(statementLines(DARK_70));
    expect(statement.eu.map((i) => i.segments)).toEqual([
      [{ text: "cocoa nibs" }],
      [{ text: "sugar" }],
      [{ text: "cocoa butter" }],
      [{ text: "emulsifier (" }, { text: "soya", emphasis: true }, { text: " lecithin)" }],
    ]);
    expect(statement.us.map((i) => i.name)).toEqual(["cacao nibs", "sugar", "cocoa butter", "soy lecithin"]);
    // Cocoa solids: 65 × 0.55 + 5 = 40.75 butter, 65 × 0.43 = 27.95 non-fat → 68.7 → "68 % minimum"
    // (Directive 2000/36/EC Art. 3, from memory); no milk → no milk solids statement.
    expect(solidsStatements(evaluateRecipe({ lines: engineLines(DARK_70) }))).toMatchObject({ cocoa: "cocoa solids: 68 % minimum", milk: null });
  });
});

describe("the 45 % milk (37 nibs, 9 cocoa butter, 24 whole milk powder, 29.6 sugar, 0.4 lecithin)", () => {
  const { per100g } = computeNutrition(nutritionLines(MILK_45));

  it("computes the EU table per 100 g", () => {
    // fat 20.35 + 9 + 6.4104 + 0.4 = 36.1604 → 36 g; saturates 12.1508 + 5.373 + 4.0176 + 0.06004
    // = 21.60144 → 22 g; carbohydrate by difference 9.731 + 9.2208 + 29.594080 = 48.54588, fibre
    // 37 × 0.154 = 5.698 → available 42.84788 → 43 g; sugars 0.3108 + 9.2208 + 29.57336 = 39.10496 → 39 g;
    // fibre 5.7 g; protein 4.9173 + 6.3168 = 11.2341 → 11 g; salt 0.020609 + 0.2226 + 0.00074
    // = 0.243949 → 0.24 g. kJ 37 × 36.1604 + 17 × (42.84788 + 11.2341) + 8 × 5.698 = 2302.91246 → 2303;
    // kcal 9 × 36.1604 + 4 × 54.08198 + 2 × 5.698 = 553.16752 → 553 (Annex XIV).
    expect(euNutritionDeclaration(per100g).map((r) => [r.key, r.per100g])).toEqual([
      ["energy", "2303 kJ / 553 kcal"], ["fat", "36 g"], ["saturates", "22 g"], ["carbohydrate", "43 g"],
      ["sugars", "39 g"], ["fibre", "5.7 g"], ["protein", "11 g"], ["salt", "0.24 g"],
    ]);
  });

  it("serves a 100 g bar in thirds of 33 g", () => {
    // 100 g > 300 % of 30 g: one column; 100 / 3 = 33.3 g is the fraction closest to 30 g
    // (21 CFR 101.9(b)(2)(ii), from memory), declared as 33 g, 3 servings.
    // Per 33 g: kcal 4 × 3.707253 + 4 × 16.0201404 + 9 × 11.932932 = 186.3059616 → 190; fat 11.93 → 12 g
    // (15 %); saturates 7.128 → 7 g (35 %); sodium 32.2 mg → 30 mg (1 %); carbohydrate 16.02 → 16 g (6 %);
    // fibre 1.88 → 2 g (7 %); sugars 12.9 → 13 g; added 9.759 → 10 g (20 %); protein 3.707 → 4 g.
    const serving = usServingSize({ packageGrams: 100 });
    if (!serving.ok) throw new Error(serving.reason);
    const panel = usNutritionPanel(per100g, serving);
    expect([panel.kind, panel.servingSize, panel.servingsPerContainer, panel.calories]).toEqual(["multiple-servings", "1/3 bar (33g)", "3", { perServing: "190" }]);
    expect(panel.rows.filter((r) => r.perServing).map((r) => [r.key, r.perServing!.amount, r.perServing!.percentDailyValue ?? null])).toEqual([
      ["fat", "12g", "15%"], ["saturates", "7g", "35%"], ["sodium", "30mg", "1%"], ["carbohydrate", "16g", "6%"],
      ["fibre", "2g", "7%"], ["sugars", "13g", null], ["addedSugars", "10g", "20%"], ["protein", "4g", null],
    ]);
    expect(panel.rows.every((r) => r.perPackage === undefined)).toBe(true);
  });

  it("declares milk and soy, emphasised in the EU list and in the US Contains statement", () => {
    // EU Annex II points 7 (milk) and 6 (soybeans; soy lecithin is not exempt); FALCPA 21 U.S.C. 343(w).
    const statement = buildIngredientStatement(statementLines(MILK_45));
    expect(statement.eu.map((i) => i.segments)).toEqual([
      [{ text: "cocoa nibs" }],
      [{ text: "sugar" }],
      [{ text: "whole " }, { text: "milk", emphasis: true }, { text: " powder" }],
      [{ text: "cocoa butter" }],
      [{ text: "emulsifier (" }, { text: "soya", emphasis: true }, { text: " lecithin)" }],
    ]);
    const allergens = allergenSummary(statementLines(MILK_45));
    expect(allergens.eu.map((a) => [a.name, a.clause])).toEqual([
      ["soya", "Regulation (EU) No 1169/2011 Annex II point 6"],
      ["milk", "Regulation (EU) No 1169/2011 Annex II point 7"],
    ]);
    expect(allergens.usContains).toBe("Contains: Soy, Milk.");
  });

  it("states cocoa solids 45 % and milk solids 23 % on the EU basis, rounded down", () => {
    // Cocoa butter 37 × 0.55 + 9 = 29.35; non-fat 37 × 0.43 = 15.91; total 45.26 → 45.
    // Dry milk solids 24 × (26.71 + 70.82) / 100 = 23.4072 → 23 (Directive 2000/36/EC Art. 3, from memory).
    const result = solidsStatements(evaluateRecipe({ lines: engineLines(MILK_45) }));
    expect([result.cocoa, result.milk]).toEqual(["cocoa solids: 45 % minimum", "milk solids: 23 % minimum"]);
  });
});
