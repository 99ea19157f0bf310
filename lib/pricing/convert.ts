/**
 * Price arithmetic for quotes and exchange rates: pure, exact (decimal.js), no
 * clock and no I/O. Dates are ISO calendar days ("2026-03-01"), compared as
 * strings. Amounts come in and go out as decimal strings; rounding is left to
 * the display.
 */
import Decimal from "decimal.js";

/** 34 significant digits (decimal128), half-even: the same output precision as the engine. */
const Money = Decimal.clone({ precision: 34, rounding: Decimal.ROUND_HALF_EVEN, toExpNeg: -1000, toExpPos: 1000 });

export type PriceUnit = "per_kg" | "per_pack" | "per_tonne";

export type QuoteAmount = {
  /** Price as a decimal string, in `currency`. */
  price: string;
  unit: PriceUnit;
  /** Pack size in kg; required for `per_pack`. */
  packKg?: string | null;
};

export type Failure = { ok: false; code: "no_pack_size" | "no_exchange_rate"; reason: string };
export type Result<T> = { ok: true; value: T } | Failure;

/** A plain-notation decimal string ("12.5", never "1.25e+1", never "-0"). */
function out(value: Decimal): string {
  return value.isZero() ? "0" : value.toFixed();
}

/**
 * Price per kilogram in the quote's own currency: per kg as is, per tonne ÷ 1000
 * (SI: 1 t = 1000 kg), per pack ÷ the pack's mass in kg.
 */
export function pricePerKg(quote: QuoteAmount): Result<string> {
  const price = new Money(quote.price);
  switch (quote.unit) {
    case "per_kg":
      return { ok: true, value: out(price) };
    case "per_tonne":
      return { ok: true, value: out(price.div(1000)) };
    case "per_pack": {
      const pack = quote.packKg ? new Money(quote.packKg) : null;
      if (!pack || pack.lte(0)) return { ok: false, code: "no_pack_size", reason: "A per-pack price needs the pack's mass in kg." };
      return { ok: true, value: out(price.div(pack)) };
    }
  }
}

export type DatedRate = { currency: string; rateToBase: string; validOn: string };

/**
 * The rate for `currency` on day `on`: the one entered with the latest `validOn`
 * on or before `on`. The base currency is always 1. Null when none applies yet.
 */
export function rateOn(rates: readonly DatedRate[], currency: string, on: string, base: string): DatedRate | null {
  if (currency === base) return { currency, rateToBase: "1", validOn: on };
  let best: DatedRate | null = null;
  for (const r of rates) {
    if (r.currency !== currency || r.validOn > on) continue;
    if (!best || r.validOn > best.validOn) best = r;
  }
  return best;
}

/** `amount` of `currency` in the base currency on day `on`, with the rate used. */
export function toBase(
  amount: string,
  currency: string,
  ctx: { base: string; rates: readonly DatedRate[]; on: string },
): Result<{ amount: string; rate: DatedRate }> {
  const rate = rateOn(ctx.rates, currency, ctx.on, ctx.base);
  if (!rate) {
    return { ok: false, code: "no_exchange_rate", reason: `No ${currency} → ${ctx.base} exchange rate on or before ${ctx.on}. Add one under Currencies.` };
  }
  return { ok: true, value: { amount: out(new Money(amount).times(rate.rateToBase)), rate } };
}

export type DatedQuote = { validFrom: string; validUntil?: string | null; createdAt?: Date | string | null };

/** Whether a quote applies on day `on` (valid from and until are both inclusive). */
export function isValidOn(quote: DatedQuote, on: string): boolean {
  return quote.validFrom <= on && (!quote.validUntil || quote.validUntil >= on);
}

/**
 * The current quote on day `on`: among the quotes valid that day, the one that
 * took effect last (latest `validFrom`); on a tie, the one entered last. Older
 * quotes stay as history; they are never overwritten.
 */
export function currentQuote<Q extends DatedQuote>(quotes: readonly Q[], on: string): Q | null {
  let best: Q | null = null;
  for (const q of quotes) {
    if (!isValidOn(q, on)) continue;
    if (!best || q.validFrom > best.validFrom || (q.validFrom === best.validFrom && entered(q) > entered(best))) best = q;
  }
  return best;
}

function entered(q: DatedQuote): number {
  return q.createdAt ? new Date(q.createdAt).getTime() : 0;
}

/**
 * A quote's price per kg in the base currency on day `on` (the exchange rate of
 * that day, see rateOn). Fails with a reason a person can act on.
 */
export function quotePerKgInBase(
  quote: QuoteAmount & { currency: string },
  ctx: { base: string; rates: readonly DatedRate[]; on: string },
): Result<{ perKg: string; perKgQuoted: string; rate: DatedRate }> {
  const perKg = pricePerKg(quote);
  if (!perKg.ok) return perKg;
  const converted = toBase(perKg.value, quote.currency, ctx);
  if (!converted.ok) return converted;
  return { ok: true, value: { perKg: converted.value.amount, perKgQuoted: perKg.value, rate: converted.value.rate } };
}

/** Percent change from `before` to `after` (null when `before` is 0). */
export function percentChange(before: string, after: string): string | null {
  const b = new Money(before);
  if (b.isZero()) return null;
  return out(new Money(after).minus(b).div(b).times(100));
}

/** A moment's calendar day in UTC, as YYYY-MM-DD (callers pass the clock in). */
export function isoDay(date: Date): string {
  return date.toISOString().slice(0, 10);
}
