import { describe, expect, it } from "vitest";
import { processGuide, TEMPERING_CURVES } from "@/lib/batches/process-guide";
import { sheetAllergens } from "@/lib/batches/sheet";
import { orderCsv, orderMailText } from "@/lib/purchasing/order-document";

const order = {
  number: "PO-2026-0003",
  supplierName: "Holloway Dairy Powders",
  notes: null,
  totals: { EUR: "312" },
  lines: [
    { position: 1, ingredientName: "Whole milk powder", quantityKg: "75", packKg: "25", packs: 3, price: "104", currency: "EUR", priceUnit: "per_pack", amount: "312" },
    { position: 2, ingredientName: "=Skim milk powder", quantityKg: "0", packKg: null, packs: null, price: "3.1", currency: "EUR", priceUnit: "per_kg", amount: "0" },
  ],
};

describe("the purchase order documents", () => {
  it("writes the CSV with the ordered lines only", () => {
    expect(orderCsv(order)).toBe(
      '"Order","Line","Item","Quantity (kg)","Packs","Pack size (kg)","Price","Currency","Price unit","Amount"\r\n' +
        '"PO-2026-0003","1","Whole milk powder","75","3","25","104","EUR","per pack","312.00"\r\n',
    );
  });

  it("neutralises a formula in an item name (OWASP CSV Injection)", () => {
    const csv = orderCsv({ ...order, lines: [{ ...order.lines[1]!, quantityKg: "5" }] });
    expect(csv).toContain(`"'=Skim milk powder"`);
  });

  it("writes a mail that lists the lines with packs and price", () => {
    const text = orderMailText(order, "Fenwick Lane Chocolate Works");
    expect(text).toContain("  1. Whole milk powder: 75 kg (3 × 25 kg) at EUR 104 per pack");
    expect(text).toContain("Order value at your quoted prices: EUR 312.00.");
    expect(text).not.toContain("Skim");
  });
});

describe("the batch sheet's process and allergen notes", () => {
  it("prints the tempering curve for each chocolate type (REFERENCE.md §5, common practice)", () => {
    expect(TEMPERING_CURVES.dark).toEqual({ melt: "45–55 °C", cool: "27–29 °C", work: "31–32 °C" });
    expect(TEMPERING_CURVES.milk).toEqual({ melt: "40–50 °C", cool: "27–28 °C", work: "29–31 °C" });
    expect(TEMPERING_CURVES.white).toEqual({ melt: "40–45 °C", cool: "25–27 °C", work: "28–30 °C" });
    const steps = processGuide({ chocolateType: "milk", refiningHours: "18", conchingHours: "24" });
    const tempering = steps.find((s) => s.key === "tempering")!;
    expect(tempering.parameters.map((p) => p.typical)).toEqual(["40–50 °C", "27–28 °C", "29–31 °C"]);
    expect(steps.find((s) => s.key === "conching")!.parameters.map((p) => [p.planned, p.typical])).toEqual([
      ["24 h", "6–72 h"], // conching 6–72 h, REFERENCE.md §5 (practice)
      [null, "43–57 °C"], // milk mass 43–57 °C, REFERENCE.md §5 (practice)
    ]);
  });

  it("defers to the maker's own process where our reference has no range", () => {
    const steps = processGuide({ chocolateType: "other" });
    expect(steps.find((s) => s.key === "tempering")!.parameters[0]!.typical).toContain("your validated process");
    const white = processGuide({ chocolateType: "white" });
    expect(white.find((s) => s.key === "conching")!.parameters[1]!.typical).toContain("no typical range");
  });

  it("lists allergens once each, in Annex II order", () => {
    // EU 1169/2011 Annex II: soybeans (point 6) before milk (point 7) before nuts (point 8).
    expect(sheetAllergens([{ allergens: ["nuts"] }, { allergens: ["milk", "soybeans"] }, { allergens: ["milk"] }])).toEqual([
      "Soybeans",
      "Milk (including lactose)",
      "Tree nuts (almond, hazelnut, walnut…)",
    ]);
  });
});
