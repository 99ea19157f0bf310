import { describe, expect, it } from "vitest";
import { allergenSummary, buildIngredientStatement, emphasiseAllergens, evaluateRecipe, solidsStatements } from "@/lib/formulation";
import { engineLines } from "./fixtures";

// Order: descending weight at mixing, Regulation (EU) No 1169/2011 Art. 18(1) and 21 CFR 101.4(a)(1).
// Emphasis: Art. 21(1)(b) (allergens of Annex II set apart, here in bold).

const line = (name: string, percent: string, allergens: string[] = []) => ({ name, percent, allergens });

describe("buildIngredientStatement ordering", () => {
  it("keeps the recipe order for equal masses (the regulations set no rule for ties)", () => {
    const statement = buildIngredientStatement([line("cocoa butter", "20"), line("cocoa mass", "40"), line("sugar", "20"), line("whole milk powder", "20", ["milk"])]);
    expect(statement.eu.map((i) => [i.name, i.percent])).toEqual([["cocoa mass", "40"], ["cocoa butter", "20"], ["sugar", "20"], ["whole milk powder", "20"]]);
  });

  it("lists an ingredient once, summing lines of the same name (case ignored)", () => {
    // Two sugar lots of 20 % each weigh 40 %: heavier than the 35 % cocoa mass.
    const statement = buildIngredientStatement([line("cocoa mass", "35"), line("Sugar", "20"), line("cocoa butter", "5"), line("sugar ", "20"), line("vanilla", "0")]);
    expect(statement.eu.map((i) => [i.name, i.percent])).toEqual([["Sugar", "40"], ["cocoa mass", "35"], ["cocoa butter", "5"]]);
  });

  it("orders the US list by the US names' groups, plain", () => {
    const statement = buildIngredientStatement([
      { name: "cocoa mass", usName: "chocolate liquor", percent: "60", allergens: [] },
      { name: "emulsifier (soya lecithin)", usName: "soy lecithin", percent: "0.5", allergens: ["soybeans"] },
    ]);
    expect(statement.us.map((i) => i.segments)).toEqual([[{ text: "chocolate liquor" }], [{ text: "soy lecithin" }]]);
  });

  it("warns about an allergen code it does not know and a percent it cannot read", () => {
    const statement = buildIngredientStatement([line("mystery", "x"), line("sugar", "10", ["kiwi"])]);
    expect(statement.warnings).toEqual([
      'sugar: unknown allergen code "kiwi"; check the ingredient.',
      'mystery: percent "x" is not a number of at least 0; left out of the list.',
    ]);
  });
});

describe("emphasiseAllergens", () => {
  it("emphasises the whole word that shows the allergen", () => {
    expect(emphasiseAllergens("buttermilk powder", ["milk"])).toEqual([{ text: "buttermilk", emphasis: true }, { text: " powder" }]);
    expect(emphasiseAllergens("Roasted hazelnuts", ["nuts"])).toEqual([{ text: "Roasted " }, { text: "hazelnuts", emphasis: true }]);
  });

  it("adds the allergen in brackets when the name does not show it", () => {
    expect(emphasiseAllergens("lecithin", ["soybeans"])).toEqual([{ text: "lecithin (" }, { text: "soya", emphasis: true }, { text: ")" }]);
    expect(emphasiseAllergens("praline paste", ["nuts", "milk"])).toEqual([
      { text: "praline paste (" }, { text: "nuts", emphasis: true }, { text: ", " }, { text: "milk", emphasis: true }, { text: ")" },
    ]);
  });

  it("does not emphasise cocoa butter, which carries no allergen", () => {
    expect(emphasiseAllergens("cocoa butter", [])).toEqual([{ text: "cocoa butter" }]);
  });
});

describe("allergenSummary", () => {
  it("names the specific tree nut and leaves out non-US allergens from Contains (FALCPA, 21 U.S.C. 343(w))", () => {
    const summary = allergenSummary([line("roasted hazelnuts", "15", ["nuts"]), line("celery salt", "1", ["celery"]), line("sesame seeds", "2", ["sesame"])]);
    expect(summary.eu.map((a) => a.name)).toEqual(["nuts", "celery", "sesame"]);
    // Sesame is the ninth US major food allergen since the FASTER Act 2021; celery is not one.
    expect(summary.usContains).toBe("Contains: Tree nuts (hazelnut), Sesame.");
  });

  it("counts cereals containing gluten as the US allergen wheat only when wheat is named", () => {
    const summary = allergenSummary([line("barley malt", "2", ["gluten"]), line("wheat flour", "3", ["gluten"])]);
    expect(summary.us).toEqual([{ code: "gluten", name: "Wheat", clause: "21 U.S.C. 321(qq); FASTER Act 2021 for sesame", ingredients: ["wheat flour"] }]);
  });

  it("ignores lines of 0 % and reports unknown codes", () => {
    const summary = allergenSummary([line("whole milk powder", "0", ["milk"]), line("sugar", "10", ["kiwi"])]);
    expect([summary.eu, summary.usContains, summary.unknown]).toEqual([[], null, ["kiwi"]]);
  });
});

describe("solidsStatements", () => {
  it("gives no cocoa or milk solids statement for white chocolate (no non-fat cocoa solids)", () => {
    const white = engineLines([{ key: "cocoa-butter", percent: "33" }, { key: "whole-milk-powder", percent: "26" }, { key: "sucrose", percent: "41" }]);
    expect(solidsStatements(evaluateRecipe({ lines: white }))).toMatchObject({ cocoa: null, milk: null });
  });

  it("states cocoa solids on the product less inclusions (Directive 2000/36/EC Annex I notes)", () => {
    // 60 nibs + 25 sugar + 15 inclusion: EU basis 85; cocoa solids 60 × 0.98 = 58.8 / 85 = 69.2 → 69.
    const lines = [...engineLines([{ key: "cocoa-nibs", percent: "60" }, { key: "sucrose", percent: "25" }]), { ingredient: { name: "Roasted hazelnuts", inclusion: true }, percent: "15" }];
    expect(solidsStatements(evaluateRecipe({ lines })).cocoa).toBe("cocoa solids: 69 % minimum");
  });
});
