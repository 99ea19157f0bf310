import "server-only";
import { and, eq, inArray } from "drizzle-orm";
import { db } from "@/db/client";
import { exchangeRates, ingredients, priceQuotes, workspaces } from "@/db/schema";
import { currentQuote, isoDay, quotePerKgInBase } from "@/lib/pricing/convert";
import type { Executor } from "./recipes-db";
import { getCurrentPrices } from "./prices";

/**
 * Price per kg in base currency of each ingredient that has one on day `on`
 * (its preferred supplier's current quote; see getCurrentPrices). Ingredients
 * without a price are simply absent: the engine then says which line lacks one.
 */
export async function currentPricesFor({
  workspaceId,
  ingredientIds,
  on,
  executor = db,
}: {
  workspaceId: string;
  ingredientIds: readonly string[];
  on: Date;
  executor?: Executor;
}): Promise<Map<string, string>> {
  if (ingredientIds.length === 0) return new Map();
  if (executor !== db) return pricesInTransaction(executor, { workspaceId, ingredientIds, on: isoDay(on) });
  const prices = await getCurrentPrices({ workspaceId, ingredientIds, on: isoDay(on) });
  const out = new Map<string, string>();
  for (const p of Object.values(prices)) if (p.status === "priced") out.set(p.ingredientId, p.pricePerKg);
  return out;
}

/**
 * The same rule read through an open transaction. getCurrentPrices reads
 * through the pool, which cannot see rows the demo seed has not committed yet
 * (its workspace, quotes and rates); the choice and the conversion are the
 * same pure functions it uses.
 */
async function pricesInTransaction(
  tx: Executor,
  { workspaceId, ingredientIds, on }: { workspaceId: string; ingredientIds: readonly string[]; on: string },
): Promise<Map<string, string>> {
  // One after another: a transaction is one connection.
  const [workspace] = await tx.select({ base: workspaces.baseCurrency }).from(workspaces).where(eq(workspaces.id, workspaceId));
  const rates = await tx
    .select({ currency: exchangeRates.currency, rateToBase: exchangeRates.rateToBase, validOn: exchangeRates.validOn })
    .from(exchangeRates)
    .where(eq(exchangeRates.workspaceId, workspaceId));
  const quotes = await tx
    .select({ quote: priceQuotes })
    .from(priceQuotes)
    .innerJoin(ingredients, and(eq(ingredients.id, priceQuotes.ingredientId), eq(ingredients.preferredSupplierId, priceQuotes.supplierId)))
    .where(and(eq(priceQuotes.workspaceId, workspaceId), inArray(priceQuotes.ingredientId, [...ingredientIds])));
  const out = new Map<string, string>();
  if (!workspace) return out;
  for (const id of new Set(ingredientIds)) {
    const quote = currentQuote(quotes.filter((q) => q.quote.ingredientId === id).map((q) => q.quote), on);
    if (!quote) continue;
    const converted = quotePerKgInBase(quote, { base: workspace.base, rates, on });
    if (converted.ok) out.set(id, converted.value.perKg);
  }
  return out;
}
