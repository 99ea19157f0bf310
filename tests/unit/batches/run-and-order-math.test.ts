import { describe, expect, it } from "vitest";
import { lineDeviation } from "@/lib/batches/deviation";
import { formatGrams } from "@/lib/batches/format-mass";
import { inWeighingOrder } from "@/lib/batches/weighing-order";
import { lineAmount, orderQuantity, totalsByCurrency } from "@/lib/purchasing/order-quantity";

describe("lineDeviation", () => {
  it("flags a line beyond the tolerance and not one within it", () => {
    expect(lineDeviation({ plannedGrams: "10000", actualGrams: "10150", tolerancePercent: "1", resolutionGrams: "1" })).toEqual({
      differenceGrams: "150",
      differencePercent: "1.50",
      flagged: true,
    });
    expect(lineDeviation({ plannedGrams: "10000", actualGrams: "9900", tolerancePercent: "1", resolutionGrams: "1" }).flagged).toBe(false); // exactly 1 %
  });

  it("never flags a difference of one scale step", () => {
    // 30 g of lecithin: 1 g off is 3.3 %, but the 1 g scale cannot show less, so only 2 g off is flagged.
    expect(lineDeviation({ plannedGrams: "30", actualGrams: "31", tolerancePercent: "1", resolutionGrams: "1" }).flagged).toBe(false);
    expect(lineDeviation({ plannedGrams: "30", actualGrams: "32", tolerancePercent: "1", resolutionGrams: "1" }).flagged).toBe(true);
  });
});

describe("formatGrams", () => {
  it("shows as many decimals as the scale step", () => {
    expect(formatGrams("7680", "1")).toBe("7.680 kg");
    expect(formatGrams("312400", "100")).toBe("312.4 kg");
    expect(formatGrams("36", "1")).toBe("36 g");
    expect(formatGrams("2.5", "0.1")).toBe("2.5 g");
    expect(formatGrams("64000000", "100")).toBe("64,000.0 kg");
  });
});

describe("inWeighingOrder", () => {
  it("weighs cocoa first and lecithin and inclusions last", () => {
    const lines = [
      { ingredientKind: "lecithin" as const, position: 1 },
      { ingredientKind: "inclusion" as const, position: 2 },
      { ingredientKind: "sugar" as const, position: 3 },
      { ingredientKind: "nibs" as const, position: 4 },
      { ingredientKind: "cocoa_butter" as const, position: 5 },
    ];
    expect(inWeighingOrder(lines).map((l) => l.position)).toEqual([4, 5, 3, 1, 2]);
  });
});

describe("orderQuantity", () => {
  it("rounds a shortfall up to whole packs", () => {
    expect(orderQuantity({ neededKg: "61.2", packKg: "25" })).toEqual({ quantityKg: "75", packs: 3 });
    expect(orderQuantity({ neededKg: "50", packKg: "25" })).toEqual({ quantityKg: "50", packs: 2 });
  });

  it("orders at least the minimum, then whole packs", () => {
    expect(orderQuantity({ neededKg: "12", packKg: "25", minimumOrderKg: "100" })).toEqual({ quantityKg: "100", packs: 4 });
    expect(orderQuantity({ neededKg: "12", packKg: "30", minimumOrderKg: "100" })).toEqual({ quantityKg: "120", packs: 4 });
  });

  it("rounds up to whole kilograms without a pack size, and orders nothing when nothing is short", () => {
    expect(orderQuantity({ neededKg: "3.2" })).toEqual({ quantityKg: "4", packs: null });
    expect(orderQuantity({ neededKg: "0", packKg: "25" })).toEqual({ quantityKg: "0", packs: 0 });
  });
});

describe("lineAmount", () => {
  it("prices per kg, per tonne and per pack", () => {
    expect(lineAmount({ quantityKg: "40", price: "19.8", unit: "per_kg", packKg: null })).toBe("792");
    expect(lineAmount({ quantityKg: "500", price: "985", unit: "per_tonne", packKg: null })).toBe("492.5"); // 0.5 t × 985
    expect(lineAmount({ quantityKg: "75", price: "104", unit: "per_pack", packKg: "25" })).toBe("312"); // 3 packs
    expect(lineAmount({ quantityKg: "75", price: "104", unit: "per_pack", packKg: null })).toBeNull();
  });

  it("totals per currency", () => {
    expect(totalsByCurrency([{ amount: "792", currency: "EUR" }, { amount: "312.1", currency: "EUR" }, { amount: "10", currency: "GBP" }, { amount: null, currency: null }])).toEqual({
      EUR: "1104.1",
      GBP: "10",
    });
  });
});
