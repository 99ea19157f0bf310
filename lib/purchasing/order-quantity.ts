/**
 * Purchase-order arithmetic: pure and exact (decimal.js); kilograms and prices
 * as decimal strings in, decimal strings out.
 */
import Decimal from "decimal.js";
import type { PriceUnit } from "@/lib/pricing/convert";

const out = (d: Decimal) => (d.isZero() ? "0" : d.toFixed());

/**
 * What to order for a shortfall: at least the minimum order, then rounded up to
 * whole packs when the quote has a pack size, else up to whole kilograms (our
 * choice: suppliers sell bulk ingredients by the kilo; the buyer may edit a draft).
 * Nothing short → nothing ordered.
 */
export function orderQuantity(input: { neededKg: string; packKg?: string | null; minimumOrderKg?: string | null }): {
  quantityKg: string;
  packs: number | null;
} {
  const needed = new Decimal(input.neededKg);
  if (needed.lte(0)) return { quantityKg: "0", packs: input.packKg ? 0 : null };
  const wanted = Decimal.max(needed, input.minimumOrderKg ?? 0);
  const pack = input.packKg ? new Decimal(input.packKg) : null;
  if (pack && pack.gt(0)) {
    const packs = wanted.div(pack).ceil();
    return { quantityKg: out(packs.times(pack)), packs: packs.toNumber() };
  }
  return { quantityKg: out(wanted.ceil()), packs: null };
}

/**
 * A line's amount in the quote's currency: per kg × kg, per tonne × kg ÷ 1000,
 * per pack × packs (packs from the quantity and pack size, rounded up). Null
 * when there is no price, or a per-pack price has no pack size.
 */
export function lineAmount(input: { quantityKg: string; price: string | null; unit: PriceUnit | null; packKg: string | null }): string | null {
  if (input.price === null || input.unit === null) return null;
  const qty = new Decimal(input.quantityKg);
  const price = new Decimal(input.price);
  if (input.unit === "per_kg") return out(qty.times(price));
  if (input.unit === "per_tonne") return out(qty.div(1000).times(price));
  if (!input.packKg || new Decimal(input.packKg).lte(0)) return null;
  return out(qty.div(input.packKg).ceil().times(price));
}

/** Sums amounts per currency (orders may mix a supplier's quotes in several currencies). */
export function totalsByCurrency(lines: ReadonlyArray<{ amount: string | null; currency: string | null }>): Record<string, string> {
  const totals: Record<string, Decimal> = {};
  for (const l of lines) {
    if (l.amount === null || !l.currency) continue;
    totals[l.currency] = (totals[l.currency] ?? new Decimal(0)).plus(l.amount);
  }
  return Object.fromEntries(Object.entries(totals).map(([c, v]) => [c, out(v)]));
}
