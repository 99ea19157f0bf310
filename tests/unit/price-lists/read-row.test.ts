import { describe, expect, it } from "vitest";
import { guessMapping } from "@/lib/price-lists/fields";
import { parsePriceListCsv } from "@/lib/price-lists/parse";
import { normaliseDate, normaliseNumber, normaliseUnit, readPriceListRow, type ReadOptions } from "@/lib/price-lists/read-row";

describe("guessMapping", () => {
  it("maps common header words, exact names first", () => {
    expect(guessMapping(["Item", "Net price", "CCY", "UoM", "Pack size (kg)", "MOQ", "Effective from", "Expires"])).toEqual({
      ingredient: 0, price: 1, currency: 2, unit: 3, packKg: 4, minimumOrderKg: 5, validFrom: 6, validUntil: 7,
    });
    expect(guessMapping(["Code", "Remarks"])).toMatchObject({ ingredient: null, price: null });
  });
});

describe("normalising what suppliers write", () => {
  it.each([
    ["1.234,50", ",", "1234.50"],
    ["12,5", ",", "12.5"],
    ["1,234.5", ".", "1234.5"],
    ["€ 12.50", ".", "12.50"],
    ["25 kg", ".", "25"],
    // A decimal comma with "point" chosen is not silently read as 1250.
    ["12,50", ".", "12,50"],
  ] as const)("reads %j with %j as %j", (raw, sep, expected) => {
    expect(normaliseNumber(raw, sep)).toBe(expected);
  });

  it.each([
    ["", "per_kg"], ["per kg", "per_kg"], ["EUR/kg", "per_kg"], ["1 t", "per_tonne"], ["per tonne", "per_tonne"], ["Bag", "per_pack"], ["litre", null],
  ] as const)("reads the unit %j as %s", (raw, unit) => {
    expect(normaliseUnit(raw)).toBe(unit);
  });

  it("reads dates in the chosen format and refuses impossible ones", () => {
    expect(normaliseDate("01/03/2026", "DD/MM/YYYY")).toBe("2026-03-01");
    expect(normaliseDate("03/01/2026", "MM/DD/YYYY")).toBe("2026-03-01");
    expect(normaliseDate("1.3.2026", "DD.MM.YYYY")).toBe("2026-03-01");
    expect(normaliseDate("2026-02-29", "YYYY-MM-DD")).toBeNull(); // 2026 is not a leap year
    expect(normaliseDate("2026-03-01", "DD/MM/YYYY")).toBeNull();
  });
});

describe("parsePriceListCsv", () => {
  it("detects the delimiter and numbers rows as a spreadsheet does, blank rows included", () => {
    const parsed = parsePriceListCsv('Ingredient;Price\n"Sugar; fine";1,2\n\nButter;20\n');
    expect(parsed).toMatchObject({ ok: true, delimiter: ";", headers: ["Ingredient", "Price"] });
    expect(parsed.ok && parsed.rows).toEqual([
      { rowNumber: 2, cells: ["Sugar; fine", "1,2"] },
      { rowNumber: 4, cells: ["Butter", "20"] },
    ]);
  });

  it("explains an unclosed quote", () => {
    expect(parsePriceListCsv('Ingredient,Price\n"Sugar,1\nButter,2\n')).toMatchObject({ ok: false, reason: expect.stringMatching(/never closed/) });
  });
});

describe("readPriceListRow", () => {
  const sugar = { id: "s", name: "Sugar (sucrose)", archived: false };
  const opts: ReadOptions = {
    mapping: { ingredient: 0, price: 1, currency: null, unit: 2, packKg: 3, minimumOrderKg: null, validFrom: null, validUntil: null },
    decimalSeparator: ".",
    dateFormat: "YYYY-MM-DD",
    defaultValidFrom: "2026-11-01",
    defaultCurrency: "GBP",
  };
  const lookup = (n: string) => (n.toLowerCase() === "sugar (sucrose)" ? sugar : undefined);

  it("takes the supplier's currency and the list's date when the row has none", () => {
    expect(readPriceListRow(["Sugar (sucrose)", "28.5", "bag", "25 kg"], opts, lookup)).toEqual({
      ok: true,
      ingredient: sugar,
      quote: { price: "28.5", currency: "GBP", unit: "per_pack", packKg: "25", minimumOrderKg: null, validFrom: "2026-11-01", validUntil: null },
    });
  });

  it("lists every problem of a row at once", () => {
    const r = readPriceListRow(["Glitter", "-3", "pack", ""], opts, lookup);
    expect(r).toMatchObject({ ok: false, ingredientName: "Glitter" });
    expect(!r.ok && r.reasons).toEqual([
      "Ingredient: no ingredient called “Glitter” in your library. Add it, or correct the name.",
      "Price: Enter the price as a number, like 12.5 (a dot for decimals, no units).",
      "Pack size (kg): A per-pack price needs the pack size in kg.",
    ]);
  });
});
