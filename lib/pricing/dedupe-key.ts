import { createHash } from "node:crypto";
import Decimal from "decimal.js";

export type QuoteIdentity = {
  supplierId: string;
  ingredientId: string;
  price: string;
  currency: string;
  unit: string;
  packKg: string | null;
  minimumOrderKg: string | null;
  validFrom: string;
  validUntil: string | null;
};

const canonical = (v: string | null) => (v === null ? "" : new Decimal(v).toFixed());

/**
 * The identity of a quote's content, as a SHA-256 hex digest: the same supplier,
 * ingredient, price, currency, unit, pack, minimum order and period give the
 * same key however the figures were written ("12.50" = "12.5"). Stored in
 * price_quotes.dedupe_key (unique per workspace), so uploading a price list
 * twice, or typing the same quote again, never records it twice.
 */
export function quoteDedupeKey(q: QuoteIdentity): string {
  const parts = [
    q.supplierId,
    q.ingredientId,
    canonical(q.price),
    q.currency.toUpperCase(),
    q.unit,
    canonical(q.packKg),
    canonical(q.minimumOrderKg),
    q.validFrom,
    q.validUntil ?? "",
  ];
  return createHash("sha256").update(JSON.stringify(parts)).digest("hex");
}
