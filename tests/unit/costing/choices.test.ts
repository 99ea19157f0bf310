import { describe, expect, it } from "vitest";
import { buildCostingReport, choicesFor, parseOptionKey } from "@/lib/costing";
import { costRecipe } from "@/lib/formulation";
import { eurOption, id, line, settings } from "./fixtures";

const ON = "2026-12-01";

describe("choicesFor", () => {
  const saltmarsh = eurOption("Saltmarsh Sugar Company", "1.131765");
  const tallis = eurOption("Tallis Fine Ingredients", "1.30986");

  it("takes the preferred, the cheapest, and the pick", () => {
    const sugar = line("Sugar", "30", [tallis, saltmarsh], { pickKey: tallis.key, pickLabel: tallis.label });
    expect(choicesFor([sugar], "preferred", ON)[0]).toMatchObject({ key: tallis.key, perKg: "1.30986", note: null });
    expect(choicesFor([sugar], "cheapest", ON)[0]).toMatchObject({ key: saltmarsh.key, perKg: "1.131765" });
    expect(choicesFor([sugar], "chosen", ON)[0]).toMatchObject({ key: tallis.key });
  });

  it("says why the preferred supplier gives no price", () => {
    const none = line("Vanilla", "0.1", [tallis], { preferredKey: null, preferredSupplierName: null });
    expect(choicesFor([none], "preferred", ON)[0]).toMatchObject({ key: null, note: "Vanilla has no preferred supplier." });
    // The preferred supplier exists but has no quote valid today: its option is absent.
    const gone = line("Sugar", "30", [tallis], { preferredKey: `supplier:${id()}`, preferredSupplierName: "Saltmarsh Sugar Company" });
    expect(choicesFor([gone], "preferred", ON)[0]!.note).toBe("No quote from Saltmarsh Sugar Company for Sugar is valid on 2026-12-01.");
    const unconverted = eurOption("Harbourline Cocoa (invented)", "1", { perKg: null, problem: "No USD → EUR exchange rate on or before 2026-12-01. Add one under Currencies." });
    expect(choicesFor([line("Liquor", "50", [unconverted])], "preferred", ON)[0]!.note).toMatch(/No USD → EUR exchange rate/);
  });

  it("falls back to the preferred supplier when the pick has no valid price, and says so", () => {
    const sugar = line("Sugar", "30", [saltmarsh], { pickKey: `supplier:${id()}`, pickLabel: "Tallis Fine Ingredients" });
    expect(choicesFor([sugar], "chosen", ON)[0]).toEqual({
      ingredientId: sugar.ingredientId,
      key: saltmarsh.key,
      perKg: "1.131765",
      note: "Your pick for Sugar (Tallis Fine Ingredients) has no valid price on 2026-12-01; the preferred supplier is used.",
    });
  });

  it("leaves a line unpriced when nothing is valid, and the engine names it", () => {
    const lines = [line("Nibs", "70", [eurOption("Greyfriars Bean Importers", "16.2")]), line("Sugar", "30", [])];
    const report = buildCostingReport({ lines, settings: settings(), barMassGrams: "70", on: ON });
    expect(report.scenarios.cheapest.choices[1]).toMatchObject({ key: null, note: "No source of Sugar has a valid price." });
    expect(report.scenarios.cheapest.cost).toMatchObject({ ok: false, reason: "No price per kg for line 2 (Sugar).", missingPriceLines: [1] });
    expect(report.scenarios.cheapest.margins).toBeNull();
  });
});

describe("buildCostingReport", () => {
  it("lists supplier columns then lot columns, by name, and the cost per bar with each source swapped in", () => {
    const b = eurOption("Bellweather Butters", "19.8");
    const a = eurOption("Alder Row Butters (invented)", "18");
    const lot = { ...eurOption("Lot A-1 (Peru)", "9"), kind: "lot" as const, key: `lot:${id()}` };
    const lines = [line("Cocoa butter", "30", [b, a]), line("Nibs", "70", [lot], { preferredKey: null })];
    const report = buildCostingReport({ lines, settings: settings(), barMassGrams: "100", on: ON });
    expect(report.columns.map((c) => c.label)).toEqual(["Alder Row Butters (invented)", "Bellweather Butters", "Lot A-1 (Peru)"]);
    // Chosen (no pick): butter from Bellweather, nibs unpriced (no preferred) → every swap of butter still lacks nibs.
    expect(report.swaps[0]!.bars.map((x) => x.costPerBar)).toEqual([null, null]);
    // Swapping the lot into nibs with butter at Bellweather: 0.1 kg × (0.3 × 19.8 + 0.7 × 9) = 0.1 × 12.24 = 1.224.
    expect(report.swaps[1]!.bars).toEqual([{ key: lot.key, label: "Lot A-1 (Peru)", costPerBar: "1.224" }]);
  });
});

describe("parseOptionKey", () => {
  it("reads supplier and lot keys and nothing else", () => {
    const uuid = id();
    expect(parseOptionKey(`supplier:${uuid}`)).toEqual({ kind: "supplier", id: uuid });
    expect(parseOptionKey(`lot:${uuid}`)).toEqual({ kind: "lot", id: uuid });
    expect(parseOptionKey(`quote:${uuid}`)).toBeNull();
    expect(parseOptionKey("supplier:1")).toBeNull();
  });
});

describe("costRecipe overhead per bar", () => {
  it("adds a fixed overhead to each bar, next to the overhead per kg", () => {
    // 50 g at 10/kg = 0.5; overhead 0.05 × 2 + 0.07 = 0.17 → 0.67.
    const result = costRecipe([{ ingredient: { name: "Mass", pricePerKg: 10 }, percent: 100 }], { barMassGrams: 50, overheadPerKg: 2, overheadPerBar: "0.07" });
    expect(result).toMatchObject({ ok: true, costPerBar: "0.67", breakdown: { overhead: "0.17" } });
    expect(costRecipe([{ ingredient: { name: "Mass", pricePerKg: 10 }, percent: 100 }], { barMassGrams: 50, overheadPerBar: "-1" }).ok).toBe(false);
  });
});
