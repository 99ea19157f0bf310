import { describe, expect, it } from "vitest";
import { currentQuote, isValidOn, percentChange, pricePerKg, quotePerKgInBase, rateOn, toBase } from "@/lib/pricing/convert";

describe("pricePerKg", () => {
  it.each([
    // SI: 1 t = 1000 kg.
    [{ price: "985", unit: "per_tonne" as const }, "0.985"],
    [{ price: "16.2", unit: "per_kg" as const }, "16.2"],
    [{ price: "104", unit: "per_pack" as const, packKg: "25" }, "4.16"],
    [{ price: "10", unit: "per_pack" as const, packKg: "3" }, "3.333333333333333333333333333333333"],
  ])("turns %o into %s per kg", (quote, expected) => {
    expect(pricePerKg(quote)).toEqual({ ok: true, value: expected });
  });

  it("refuses a pack price without a pack size", () => {
    expect(pricePerKg({ price: "10", unit: "per_pack", packKg: null })).toMatchObject({ ok: false, code: "no_pack_size" });
  });
});

describe("exchange rates", () => {
  const rates = [
    { currency: "USD", rateToBase: "0.938", validOn: "2026-01-05" },
    { currency: "USD", rateToBase: "0.92", validOn: "2026-10-01" },
  ];

  it("uses the latest rate dated on or before the day", () => {
    expect(rateOn(rates, "USD", "2026-09-30", "EUR")?.rateToBase).toBe("0.938");
    expect(rateOn(rates, "USD", "2026-10-01", "EUR")?.rateToBase).toBe("0.92");
    expect(rateOn(rates, "USD", "2026-01-04", "EUR")).toBeNull();
  });

  it("converts exactly, and the base currency at 1", () => {
    expect(toBase("14.6", "USD", { base: "EUR", rates, on: "2026-11-01" })).toMatchObject({ ok: true, value: { amount: "13.432" } });
    expect(toBase("14.6", "EUR", { base: "EUR", rates, on: "2026-11-01" })).toMatchObject({ ok: true, value: { amount: "14.6" } });
  });

  it("says which rate is missing", () => {
    const r = toBase("1", "GBP", { base: "EUR", rates, on: "2026-11-01" });
    expect(r).toMatchObject({ ok: false, code: "no_exchange_rate" });
    expect(!r.ok && r.reason).toMatch(/No GBP → EUR exchange rate on or before 2026-11-01/);
  });

  it("converts a per-pack USD quote to EUR per kg", () => {
    // 365 USD / 25 kg = 14.6 USD/kg; × 0.92 = 13.432 EUR/kg.
    const r = quotePerKgInBase({ price: "365", currency: "USD", unit: "per_pack", packKg: "25" }, { base: "EUR", rates, on: "2026-10-02" });
    expect(r).toMatchObject({ ok: true, value: { perKg: "13.432", perKgQuoted: "14.6" } });
  });
});

describe("currentQuote", () => {
  const q = (validFrom: string, validUntil: string | null, createdAt = "2026-01-01T00:00:00Z") => ({ validFrom, validUntil, createdAt });
  const old = q("2026-01-01", null);
  const spring = q("2026-03-01", "2026-05-31");
  const later = q("2026-06-01", null);

  it("takes the valid quote that took effect last", () => {
    expect(currentQuote([old, spring, later], "2026-04-15")).toBe(spring);
    expect(currentQuote([old, spring, later], "2026-06-01")).toBe(later);
  });

  it("falls back to an older open quote when a newer one has expired", () => {
    expect(currentQuote([old, spring], "2026-06-15")).toBe(old);
  });

  it("has none before the first quote, and counts both ends as valid", () => {
    expect(currentQuote([spring], "2026-02-28")).toBeNull();
    expect(isValidOn(spring, "2026-05-31")).toBe(true);
    expect(isValidOn(spring, "2026-06-01")).toBe(false);
  });

  it("breaks a tie on the same day by the one entered last", () => {
    const a = q("2026-03-01", null, "2026-03-01T08:00:00Z");
    const b = q("2026-03-01", null, "2026-03-01T09:00:00Z");
    expect(currentQuote([b, a], "2026-03-02")).toBe(b);
  });
});

describe("percentChange", () => {
  it("gives the change in percent, null from zero", () => {
    expect(percentChange("20", "21")).toBe("5");
    expect(percentChange("0", "1")).toBeNull();
  });
});
