/**
 * Which supplier prices a buyer should chase: the current quote of a supplier ×
 * ingredient pair that ends soon with nothing after it, or that took effect so
 * long ago it may no longer be what the supplier charges. Pure (dates are ISO
 * days, compared as text).
 */
import { currentQuote, type DatedQuote } from "./convert";

export type CheckedQuote = DatedQuote & { id: string; supplierId: string; ingredientId: string };

export type QuoteCheck<Q extends CheckedQuote> = {
  quote: Q;
  /** `ends`: valid until a day within the window, with no later quote for the pair; `old`: took effect before the age limit. */
  reason: "ends" | "old";
};

export type QuoteCheckRules = {
  /** Today, as YYYY-MM-DD. */
  on: string;
  /** A current quote ending on or before this many days from `on` is flagged (default 30). */
  endingWithinDays?: number;
  /** A current quote that took effect more than this many days before `on` is flagged (default 183, about six months). */
  olderThanDays?: number;
};

/** `day` moved by `days` (negative for earlier), as YYYY-MM-DD; calendar days in UTC. */
export function shiftDay(day: string, days: number): string {
  const d = new Date(`${day}T00:00:00Z`);
  d.setUTCDate(d.getUTCDate() + days);
  return d.toISOString().slice(0, 10);
}

/**
 * The current quotes that need a buyer's attention on day `on`, those ending
 * soonest first, then the oldest. A pair with a quote that takes effect after
 * `on` is already renewed and is left out; a pair with no quote valid on `on`
 * is not listed here (it has no current price to check).
 */
export function quotesToCheck<Q extends CheckedQuote>(quotes: readonly Q[], rules: QuoteCheckRules): QuoteCheck<Q>[] {
  const { on } = rules;
  const endBy = shiftDay(on, rules.endingWithinDays ?? 30);
  const oldBefore = shiftDay(on, -(rules.olderThanDays ?? 183));
  const pairs = new Map<string, Q[]>();
  for (const q of quotes) {
    const key = `${q.supplierId}:${q.ingredientId}`;
    const group = pairs.get(key);
    if (group) group.push(q);
    else pairs.set(key, [q]);
  }
  const ending: QuoteCheck<Q>[] = [];
  const old: QuoteCheck<Q>[] = [];
  for (const group of pairs.values()) {
    const current = currentQuote(group, on);
    if (!current) continue;
    if (group.some((q) => q.validFrom > on)) continue;
    if (current.validUntil && current.validUntil <= endBy) ending.push({ quote: current, reason: "ends" });
    else if (current.validFrom < oldBefore) old.push({ quote: current, reason: "old" });
  }
  ending.sort((a, b) => a.quote.validUntil!.localeCompare(b.quote.validUntil!) || a.quote.id.localeCompare(b.quote.id));
  old.sort((a, b) => a.quote.validFrom.localeCompare(b.quote.validFrom) || a.quote.id.localeCompare(b.quote.id));
  return [...ending, ...old];
}
