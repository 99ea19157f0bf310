import "server-only";
import { and, eq, inArray, isNotNull } from "drizzle-orm";
import { db } from "@/db/client";
import { ingredients, priceQuotes, suppliers, type PriceUnit } from "@/db/schema";
import { currentQuote, quotePerKgInBase } from "@/lib/pricing/convert";
import { getBaseCurrency, listExchangeRates } from "./exchange-rates";
import { plain } from "./numeric";

/** An ingredient's price from its preferred supplier on a day, in the base currency. */
export type CurrentPrice =
  | {
      ingredientId: string;
      status: "priced";
      /** Price per kg in `baseCurrency`, a decimal string (unrounded; round only to display). */
      pricePerKg: string;
      baseCurrency: string;
      supplierId: string;
      supplierName: string;
      quoteId: string;
      /** The quote as written: its price, currency, unit (and pack size), and start day. */
      quoted: { price: string; currency: string; unit: PriceUnit; packKg: string | null; validFrom: string; validUntil: string | null };
      /** The exchange rate used (1 for the base currency) and the day it was entered for. */
      rate: { rateToBase: string; validOn: string };
    }
  | {
      ingredientId: string;
      status: "missing";
      reason: "no_preferred_supplier" | "no_valid_quote" | "no_exchange_rate" | "bad_quote" | "unknown_ingredient";
      /** A sentence a person can act on, e.g. "No quote from Saltmarsh Sugar Company is valid on 2026-03-01." */
      message: string;
      baseCurrency: string;
      supplierId: string | null;
      supplierName: string | null;
    };

/**
 * Current prices for costing (the bench, batch costing). For each ingredient id
 * asked about: its preferred supplier's current quote on day `on` — the valid
 * quote (valid from ≤ on ≤ valid until) that took effect last, ties to the one
 * entered last — as a price per kg in the workspace's base currency, converted
 * with the latest exchange rate dated on or before `on`.
 *
 * `on` is an ISO day (YYYY-MM-DD); pass `isoDay(new Date())` from
 * lib/pricing/convert for today (UTC). Every id asked about gets an entry: ids
 * that are not this workspace's come back `missing` / `unknown_ingredient`, so
 * no price ever leaks across workspaces. Archived ingredients are still priced
 * (old recipes may use them). Reads only; two queries plus rates.
 *
 * @example
 *   const prices = await getCurrentPrices({ workspaceId, ingredientIds: [id], on: "2026-12-01" });
 *   const p = prices[id];
 *   if (p?.status === "priced") engineLine.ingredient.pricePerKg = p.pricePerKg;
 */
export async function getCurrentPrices({
  workspaceId,
  ingredientIds,
  on,
}: {
  workspaceId: string;
  ingredientIds: readonly string[];
  on: string;
}): Promise<Record<string, CurrentPrice>> {
  const ids = [...new Set(ingredientIds)];
  const [baseCurrency, rates] = await Promise.all([getBaseCurrency({ workspaceId }), listExchangeRates({ workspaceId })]);
  const result: Record<string, CurrentPrice> = {};
  if (ids.length === 0) return result;
  const found = await db
    .select({ id: ingredients.id, name: ingredients.name, supplierId: ingredients.preferredSupplierId, supplierName: suppliers.name })
    .from(ingredients)
    .leftJoin(suppliers, eq(suppliers.id, ingredients.preferredSupplierId))
    .where(and(eq(ingredients.workspaceId, workspaceId), inArray(ingredients.id, ids)));
  const quotes = await db
    .select()
    .from(priceQuotes)
    .innerJoin(ingredients, and(eq(ingredients.id, priceQuotes.ingredientId), eq(ingredients.preferredSupplierId, priceQuotes.supplierId)))
    .where(and(eq(priceQuotes.workspaceId, workspaceId), inArray(priceQuotes.ingredientId, ids), isNotNull(ingredients.preferredSupplierId)));
  const byIngredient = new Map(found.map((f) => [f.id, f]));
  for (const id of ids) {
    const ingredient = byIngredient.get(id);
    const missing = (reason: Extract<CurrentPrice, { status: "missing" }>["reason"], message: string): CurrentPrice => ({
      ingredientId: id,
      status: "missing",
      reason,
      message,
      baseCurrency,
      supplierId: ingredient?.supplierId ?? null,
      supplierName: ingredient?.supplierName ?? null,
    });
    if (!ingredient) {
      result[id] = missing("unknown_ingredient", "This ingredient is not in your library.");
      continue;
    }
    if (!ingredient.supplierId || !ingredient.supplierName) {
      result[id] = missing("no_preferred_supplier", `${ingredient.name} has no preferred supplier. Choose one on its page.`);
      continue;
    }
    const quote = currentQuote(
      quotes.filter((q) => q.price_quotes.ingredientId === id).map((q) => q.price_quotes),
      on,
    );
    if (!quote) {
      result[id] = missing("no_valid_quote", `No quote from ${ingredient.supplierName} for ${ingredient.name} is valid on ${on}.`);
      continue;
    }
    const converted = quotePerKgInBase(quote, { base: baseCurrency, rates, on });
    if (!converted.ok) {
      result[id] = missing(converted.code === "no_exchange_rate" ? "no_exchange_rate" : "bad_quote", converted.reason);
      continue;
    }
    result[id] = {
      ingredientId: id,
      status: "priced",
      pricePerKg: converted.value.perKg,
      baseCurrency,
      supplierId: ingredient.supplierId,
      supplierName: ingredient.supplierName,
      quoteId: quote.id,
      quoted: {
        price: plain(quote.price),
        currency: quote.currency,
        unit: quote.unit,
        packKg: plain(quote.packKg),
        validFrom: quote.validFrom,
        validUntil: quote.validUntil,
      },
      rate: { rateToBase: plain(converted.value.rate.rateToBase), validOn: converted.value.rate.validOn },
    };
  }
  return result;
}
