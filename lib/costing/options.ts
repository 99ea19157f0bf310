/**
 * Price options of an ingredient: a supplier's current quote converted to the
 * base currency (lib/pricing/convert does the arithmetic), or a bean lot's nib
 * cost (already in the base currency, from lib/data/lots). Pure.
 */
import Decimal from "decimal.js";
import { quotePerKgInBase, type DatedRate, type PriceUnit } from "@/lib/pricing/convert";
import type { PriceOption } from "./types";

export const supplierKey = (supplierId: string) => `supplier:${supplierId}`;
export const lotKey = (lotId: string) => `lot:${lotId}`;

/** Reads "supplier:<id>" / "lot:<id>"; null for anything else. */
export function parseOptionKey(key: string): { kind: "supplier" | "lot"; id: string } | null {
  const m = /^(supplier|lot):([0-9a-f-]{36})$/i.exec(key);
  return m ? { kind: m[1] as "supplier" | "lot", id: m[2]! } : null;
}

export type QuoteForOption = {
  price: string;
  currency: string;
  unit: PriceUnit;
  packKg: string | null;
  validUntil: string | null;
  minimumOrderKg: string | null;
};

/**
 * A supplier's current quote as an option: price per kg in `base` at the
 * exchange rate in force on day `on` (the day costed, as the bench does).
 */
export function optionFromQuote(
  supplier: { id: string; name: string; leadTimeDays: number | null },
  quote: QuoteForOption,
  ctx: { base: string; rates: readonly DatedRate[]; on: string },
): PriceOption {
  const converted = quotePerKgInBase(quote, ctx);
  return {
    key: supplierKey(supplier.id),
    kind: "supplier",
    sourceId: supplier.id,
    label: supplier.name,
    perKg: converted.ok ? converted.value.perKg : null,
    problem: converted.ok ? null : converted.reason,
    quoted: { price: quote.price, currency: quote.currency, unit: quote.unit, packKg: quote.packKg },
    validUntil: quote.validUntil,
    minimumOrderKg: quote.minimumOrderKg,
    leadTimeDays: supplier.leadTimeDays,
    estimated: false,
  };
}

/** A bean lot's nibs as an option for a nibs ingredient (cost per kg of nibs, base currency). */
export function optionFromLot(lot: { lotId: string; code: string; originCountry: string; perKg: string; estimated: boolean }): PriceOption {
  return {
    key: lotKey(lot.lotId),
    kind: "lot",
    sourceId: lot.lotId,
    label: `Lot ${lot.code} (${lot.originCountry})`,
    perKg: lot.perKg,
    problem: null,
    quoted: null,
    validUntil: null,
    minimumOrderKg: null,
    leadTimeDays: null,
    estimated: lot.estimated,
  };
}

/** The option with the lowest price per kg; on a tie, the first by label. Null when none is priced. */
export function cheapestOption(options: readonly PriceOption[]): PriceOption | null {
  let best: PriceOption | null = null;
  for (const o of options) {
    if (o.perKg === null) continue;
    if (!best) best = o;
    else {
      const cmp = new Decimal(o.perKg).comparedTo(best.perKg!);
      if (cmp < 0 || (cmp === 0 && o.label.localeCompare(best.label) < 0)) best = o;
    }
  }
  return best;
}
