/**
 * Cost per bar worked by hand, to the cent. Prices, rates and lots are invented
 * demo data; the arithmetic is ours, written out beside each check.
 */
import { describe, expect, it } from "vitest";
import { buildCostingReport, optionFromLot, optionFromQuote } from "@/lib/costing";
import { nibCostPerKg, roundMoney, summariseChain } from "@/lib/formulation";
import { eurOption, id, line, settings } from "./fixtures";

const ON = "2026-12-01";

describe("a bar priced from quotes in other currencies", () => {
  // Invented demo rates: 1 USD = 0.92 EUR from 2026-10-01, 1 GBP = 1.149 EUR from 2026-10-01.
  const rates = [
    { currency: "USD", rateToBase: "0.938", validOn: "2026-01-05" },
    { currency: "USD", rateToBase: "0.92", validOn: "2026-10-01" },
    { currency: "GBP", rateToBase: "1.149", validOn: "2026-10-01" },
  ];
  const ctx = { base: "EUR", rates, on: ON };
  const liquor = optionFromQuote(
    { id: id(), name: "Harbourline Cocoa (invented)", leadTimeDays: 42 },
    { price: "365", currency: "USD", unit: "per_pack", packKg: "25", validUntil: null, minimumOrderKg: null },
    ctx,
  );
  const sugar = optionFromQuote(
    { id: id(), name: "Saltmarsh Sugar Company", leadTimeDays: 10 },
    { price: "985", currency: "GBP", unit: "per_tonne", packKg: null, validUntil: null, minimumOrderKg: null },
    ctx,
  );

  it("converts each quote at the rate in force on the day costed", () => {
    // 365 USD ÷ 25 kg = 14.6 USD/kg × 0.92 = 13.432 EUR/kg (the 2026-10-01 rate, not the January one).
    expect(liquor.perKg).toBe("13.432");
    // 985 GBP per tonne ÷ 1000 = 0.985 GBP/kg × 1.149 = 1.131765 EUR/kg.
    expect(sugar.perKg).toBe("1.131765");
  });

  it("costs the bar and its price at a 40 % wholesale margin", () => {
    const lines = [line("Cocoa liquor", "60", [liquor]), line("Sugar", "39.5", [sugar]), line("Soy lecithin", "0.5", [eurOption("Tallis Fine Ingredients", "6.8")])];
    const report = buildCostingReport({ lines, settings: settings({ packagingPerBar: "0.25", wholesaleMarginPercent: "40" }), barMassGrams: "80", on: ON });
    const { cost, margins } = report.scenarios.preferred;
    // Per kg: 0.6 × 13.432 + 0.395 × 1.131765 + 0.005 × 6.8 = 8.0592 + 0.447047175 + 0.034 = 8.540247175 EUR.
    expect(cost.ok && cost.ingredientCostPerKg).toBe("8.540247175");
    // 80 g bar: 0.08 × 8.540247175 = 0.683219774; + packaging 0.25 = 0.933219774 → EUR 0.93.
    expect(cost.ok && cost.costPerBar).toBe("0.933219774");
    expect(roundMoney(cost.ok ? cost.costPerBar : "x")).toBe("0.93");
    // Price at 40 % margin on the price: 0.933219774 ÷ 0.6 = 1.55536629 → EUR 1.56.
    expect(margins?.wholesalePriceAtTarget).toEqual({ ok: true, value: "1.55536629" });
    expect(roundMoney("1.55536629")).toBe("1.56");
  });
});

describe("a bar with a process loss, labour, overhead and packaging", () => {
  const lines = [
    line("Cocoa nibs", "65", [eurOption("Greyfriars Bean Importers", "16.2")]),
    line("Cocoa butter", "8", [eurOption("Bellweather Butters", "19.8")]),
    line("Sugar", "27", [eurOption("Saltmarsh Sugar Company", "1.1")]),
  ];
  const model = settings({
    processLossPercent: "4",
    labourPerKg: "3.5",
    overheadPerKg: "1.2",
    overheadPerBar: "0.05",
    packagingPerBar: "0.3",
    barsPerCase: 12,
    wholesalePricePerBar: "2.8",
    retailMarginPercent: "60",
  });
  const report = buildCostingReport({ lines, settings: model, barMassGrams: "70", on: ON });
  const { cost, margins } = report.scenarios.chosen;

  it("spreads the lost chocolate over the bars that are sold", () => {
    // Per kg in: 0.65 × 16.2 + 0.08 × 19.8 + 0.27 × 1.1 = 10.53 + 1.584 + 0.297 = 12.411.
    // 4 % lost: 12.411 ÷ 0.96 = 12.928125 per kg of finished chocolate.
    expect(cost).toMatchObject({ ok: true, ingredientCostPerKg: "12.411", costPerKgFinished: "12.928125" });
    // 70 g: ingredients 0.07 × 12.411 = 0.86877; loss 0.07 × 0.517125 = 0.03619875;
    // labour 0.07 × 3.5 = 0.245; overhead 0.07 × 1.2 + 0.05 = 0.134; packaging 0.3.
    expect(cost.ok && cost.breakdown).toEqual({ ingredients: "0.86877", processLoss: "0.03619875", labour: "0.245", overhead: "0.134", packaging: "0.3" });
    // Sum 1.58396875 → EUR 1.58 per bar; × 12 = 19.007625 → EUR 19.01 per case.
    expect(cost.ok && cost.costPerBar).toBe("1.58396875");
    expect(cost.ok && cost.costPerCase).toBe("19.007625");
    expect(roundMoney("19.007625")).toBe("19.01");
  });

  it("gives the margin at the wholesale price and the retail price at its target", () => {
    // (2.80 − 1.58396875) ÷ 2.80 = 0.434296875 → 43.4296875 %.
    expect(margins?.wholesaleMargin).toEqual({ ok: true, value: "43.4296875" });
    // 1.58396875 ÷ (1 − 0.60) = 3.959921875 → EUR 3.96.
    expect(margins?.retailPriceAtTarget).toEqual({ ok: true, value: "3.959921875" });
    expect(margins?.wholesalePriceAtTarget).toBeNull();
    expect(margins?.retailMargin).toBeNull();
  });
});

describe("a bar whose nibs come from a bean lot", () => {
  // Invented lot: 200 kg of beans for EUR 1,800 plus EUR 150 freight, winnowing not recorded,
  // so the nibs are estimated at the workspace's 78 %: 156 kg.
  const chain = summariseChain({ massReceivedKg: "200", records: [], estimatedNibYieldPercent: "78" });
  const nibPerKg = nibCostPerKg({ pricePaid: "1800", extraCosts: ["150"], nibMassKg: chain.nibMassKg });
  const lotId = id();
  const lot = optionFromLot({ lotId, code: "EC-26-04", originCountry: "Ecuador", perKg: nibPerKg!, estimated: chain.nibMassEstimated });
  const quoted = eurOption("Greyfriars Bean Importers", "16.2");
  const nibs = line("Cocoa nibs", "75", [quoted, lot], { kind: "nibs" });
  const lines = [nibs, line("Sugar", "24.7", [eurOption("Saltmarsh Sugar Company", "1.1")]), line("Soy lecithin", "0.3", [eurOption("Tallis Fine Ingredients", "6.8")])];

  it("prices the nibs at the lot's cost: (1800 + 150) ÷ 156 kg = EUR 12.50 per kg", () => {
    expect(chain.nibMassKg).toBe("156");
    expect(lot.perKg).toBe("12.5");
    expect(lot).toMatchObject({ key: `lot:${lotId}`, label: "Lot EC-26-04 (Ecuador)", estimated: true });
  });

  it("finds the lot cheapest and costs the bar with it, against the preferred quote", () => {
    const report = buildCostingReport({ lines, settings: settings(), barMassGrams: "70", on: "2026-12-01" });
    // Lot: 0.75 × 12.5 + 0.247 × 1.1 + 0.003 × 6.8 = 9.375 + 0.2717 + 0.0204 = 9.6671/kg; 70 g → 0.676697 → EUR 0.68.
    const cheapest = report.scenarios.cheapest.cost;
    expect(cheapest.ok && cheapest.costPerBar).toBe("0.676697");
    expect(report.rows[0]!.cheapestKey).toBe(lot.key);
    // Preferred quote: 0.75 × 16.2 + 0.2717 + 0.0204 = 12.4421/kg; 70 g → 0.870947 → EUR 0.87.
    const preferred = report.scenarios.preferred.cost;
    expect(preferred.ok && preferred.costPerBar).toBe("0.870947");
    expect(roundMoney("0.870947")).toBe("0.87");
    // The estimate is flagged next to the lot.
    expect(report.rows[0]!.cells[lot.key]!.flags.map((f) => f.code)).toEqual(["estimated"]);
  });

  it("uses the lot in the chosen combination once the buyer picks it", () => {
    const picked = [{ ...nibs, pickKey: lot.key, pickLabel: lot.label }, ...lines.slice(1)];
    const report = buildCostingReport({ lines: picked, settings: settings(), barMassGrams: "70", on: "2026-12-01" });
    const chosen = report.scenarios.chosen.cost;
    expect(chosen.ok && chosen.costPerBar).toBe("0.676697");
    expect(report.rows[0]!.chosenKey).toBe(lot.key);
  });
});
