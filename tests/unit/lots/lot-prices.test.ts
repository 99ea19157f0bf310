import { describe, expect, it } from "vitest";
import { costRecipe, type RecipeLine } from "@/lib/formulation";
import { withLotPrices, type LotPriceSource } from "@/lib/recipes/lot-prices";

const spec = (name: string, pricePerKg: string) => ({ name, pricePerKg, cocoaButter: "50", cocoaSolidsNonFat: "45" });
const lines: RecipeLine[] = [
  { ingredient: spec("Nibs", "16.20"), percent: "64" },
  { ingredient: spec("Sugar", "1.00"), percent: "36" },
];
const ingredients = [
  { id: "nibs", kind: "nibs" },
  { id: "sugar", kind: "sugar" },
];
// A lot of 200 kg of beans bought for 1,800 + 150 freight that gave 152 kg of nibs: 1950 / 152 = 12.828947368… per kg.
const lot: LotPriceSource = { lotId: "lot-1", code: "PE-1", originCountry: "Peru", perKg: "12.828947368421052632", estimated: false };

describe("withLotPrices", () => {
  it("prices a nibs line from the chosen lot and leaves the other lines alone", () => {
    const priced = withLotPrices(lines, ingredients, { nibs: "lot-1" }, [lot]);
    expect(priced.map((l) => l.ingredient.pricePerKg)).toEqual(["12.828947368421052632", "1.00"]);
    // Hand-worked: 0.64 × 12.828947368421052632 + 0.36 × 1.00 = 8.210526315789473684 + 0.36 = 8.570526315789473684 per kg.
    const cost = costRecipe(priced, { barMassGrams: "70" });
    expect(cost.ok && cost.ingredientCostPerKg).toMatch(/^8\.5705263157894736/);
  });

  it("keeps the supplier price when nothing is chosen, the lot is unknown, or the line cannot take a lot", () => {
    expect(withLotPrices(lines, ingredients, {}, [lot])).toEqual(lines);
    expect(withLotPrices(lines, ingredients, { nibs: "gone" }, [lot])).toEqual(lines);
    expect(withLotPrices(lines, ingredients, { sugar: "lot-1" }, [lot])).toEqual(lines);
  });

  it("prices cocoa liquor from a lot too: ground nibs keep their mass", () => {
    const liquor = withLotPrices([{ ingredient: spec("Liquor", "17.00"), percent: "100" }], [{ id: "liq", kind: "cocoa_liquor" }], { liq: "lot-1" }, [lot]);
    expect(liquor[0]!.ingredient.pricePerKg).toBe("12.828947368421052632");
  });
});
