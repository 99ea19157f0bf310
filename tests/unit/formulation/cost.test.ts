import { describe, expect, it } from "vitest";
import { costRecipe, evaluateRecipe, formatPercent, marginAtPrice, priceAtMargin, roundMoney } from "@/lib/formulation";

// Invented demo prices per kg (demo data, not market quotes).
const PRICED = [
  { ingredient: { name: "Cocoa nibs", cocoaButter: 55, cocoaSolidsNonFat: 43, moisture: 2, pricePerKg: "14.20" }, percent: 60 },
  { ingredient: { name: "Cocoa butter", cocoaButter: 100, pricePerKg: "18.90" }, percent: 10 },
  { ingredient: { name: "Sugar", sugar: 100, pricePerKg: "1.05" }, percent: "29.5" },
  { ingredient: { name: "Soy lecithin", pricePerKg: "6.20" }, percent: "0.5" },
];

describe("costRecipe", () => {
  it("costs per kg, per bar and per case, exactly", () => {
    // Per kg: 0.6 × 14.20 + 0.1 × 18.90 + 0.295 × 1.05 + 0.005 × 6.20 = 8.52 + 1.89 + 0.30975 + 0.031 = 10.75075.
    // 20 % loss: 10.75075 ÷ 0.8 = 13.4384375 per finished kg.
    // 70 g bar: ingredients 0.07 × 10.75075 = 0.7525525; loss 0.07 × (13.4384375 − 10.75075) = 0.188138125;
    // labour 0.07 × 4 + 0.15 = 0.43; overhead 0.07 × 2 = 0.14; packaging 0.35 → 1.860690625; × 12 = 22.3282875.
    const result = costRecipe(PRICED, {
      barMassGrams: 70, processLossPercent: 20, labourPerKg: 4, labourPerBar: "0.15", overheadPerKg: 2, packagingPerBar: "0.35", barsPerCase: 12,
    });
    expect(result).toEqual({
      ok: true,
      ingredientCostPerKg: "10.75075",
      costPerKgFinished: "13.4384375",
      costPerBar: "1.860690625",
      costPerCase: "22.3282875",
      breakdown: { ingredients: "0.7525525", processLoss: "0.188138125", labour: "0.43", overhead: "0.14", packaging: "0.35" },
    });
  });

  it("keeps a non-terminating loss to 34 significant digits", () => {
    // 4 % loss: 10.75075 ÷ 0.96 = 11.198697916666…
    const result = costRecipe(PRICED, { barMassGrams: 100, processLossPercent: 4 });
    expect(result.ok && result.costPerKgFinished).toBe("11.19869791666666666666666666666667");
  });

  it("refuses to guess a missing price", () => {
    const lines = [PRICED[0]!, { ingredient: { name: "Vanilla" }, percent: 1 }, { ingredient: { name: "Salt" }, percent: 0 }];
    // The 0 % salt needs no price; the vanilla does.
    expect(costRecipe(lines, { barMassGrams: 70 })).toEqual({ ok: false, reason: "No price per kg for line 2 (Vanilla).", missingPriceLines: [1] });
  });

  it("rejects impossible options with a reason", () => {
    expect(costRecipe(PRICED, { barMassGrams: 0 })).toMatchObject({ ok: false });
    expect(costRecipe(PRICED, { barMassGrams: 70, processLossPercent: 100 })).toMatchObject({ ok: false });
    expect(costRecipe(PRICED, { barMassGrams: 70, packagingPerBar: "x" })).toMatchObject({ ok: false });
    expect(costRecipe(PRICED, { barMassGrams: 70, barsPerCase: "2.5" })).toMatchObject({ ok: false });
  });
});

describe("evaluateRecipe cost per kg", () => {
  it("gives the cost when every line with mass is priced", () => {
    expect(evaluateRecipe({ lines: PRICED }).costPerKg).toBe("10.75075");
  });

  it("warns about each unpriced line only when some lines are priced", () => {
    const partly = [PRICED[0]!, { ingredient: { name: "Sugar", sugar: 100 }, percent: 40 }];
    const result = evaluateRecipe({ lines: partly });
    expect(result.costPerKg).toBeUndefined();
    expect(result.warnings).toEqual([{ code: "missing-price", message: "line 2 (Sugar) has no price per kg; the cost is left out.", lineIndex: 1 }]);
    const unpriced = evaluateRecipe({ lines: [{ ingredient: { name: "Sugar", sugar: 100 }, percent: 100 }] });
    expect(unpriced.warnings).toEqual([]);
  });
});

describe("margins and display rounding", () => {
  it("prices at a margin on the price and back", () => {
    // 1.860690625 ÷ (1 − 0.60) = 4.6517265625; margin at 5 on cost 2 = 3 / 5 = 60 %.
    expect(priceAtMargin("1.860690625", 60)).toEqual({ ok: true, value: "4.6517265625" });
    expect(marginAtPrice(2, 5)).toEqual({ ok: true, value: "60" });
    expect(marginAtPrice(6, 5)).toEqual({ ok: true, value: "-20" });
    expect(priceAtMargin(2, 100).ok).toBe(false);
    expect(marginAtPrice(2, 0).ok).toBe(false);
  });

  it("rounds half up to cents only for display", () => {
    expect(roundMoney("1.860690625")).toBe("1.86");
    expect(roundMoney("0.125")).toBe("0.13");
    expect(roundMoney("2.005")).toBe("2.01");
    expect(roundMoney(3)).toBe("3.00");
    expect(roundMoney("-0.001")).toBe("0.00");
    expect(roundMoney("abc")).toBeNull();
    expect(formatPercent("68.85")).toBe("68.9");
    expect(formatPercent("70", 0)).toBe("70");
  });
});
