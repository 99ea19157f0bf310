import "server-only";
import { and, eq, inArray, isNull } from "drizzle-orm";
import { db } from "@/db/client";
import { ingredients, priceQuotes, suppliers } from "@/db/schema";
import { optionFromLot, optionFromQuote, supplierKey, type PriceOption } from "@/lib/costing";
import { currentQuote } from "@/lib/pricing/convert";
import { getBaseCurrency, listExchangeRates } from "./exchange-rates";
import { listNibSources } from "./lots";
import { plain } from "./numeric";

export type IngredientSources = {
  ingredientId: string;
  name: string;
  kind: string;
  preferredKey: string | null;
  preferredSupplierName: string | null;
  options: PriceOption[];
};

/**
 * Every source of each ingredient on day `on`, in the base currency: for each
 * supplier (not archived) its current quote for the ingredient — valid that
 * day, the one that took effect last (lib/pricing/convert currentQuote) —
 * converted at that day's rate; expired and future quotes give no option. For
 * nibs ingredients, also every bean lot with a nib cost. Ids that are not this
 * workspace's are left out.
 */
export async function listIngredientSources({
  workspaceId,
  ingredientIds,
  on,
}: {
  workspaceId: string;
  ingredientIds: readonly string[];
  on: string;
}): Promise<{ baseCurrency: string; sources: Map<string, IngredientSources> }> {
  const ids = [...new Set(ingredientIds)];
  const [baseCurrency, rates] = await Promise.all([getBaseCurrency({ workspaceId }), listExchangeRates({ workspaceId })]);
  const sources = new Map<string, IngredientSources>();
  if (ids.length === 0) return { baseCurrency, sources };
  const [found, quotes] = await Promise.all([
    db
      .select({ id: ingredients.id, name: ingredients.name, kind: ingredients.kind, preferredId: ingredients.preferredSupplierId, preferredName: suppliers.name })
      .from(ingredients)
      .leftJoin(suppliers, eq(suppliers.id, ingredients.preferredSupplierId))
      .where(and(eq(ingredients.workspaceId, workspaceId), inArray(ingredients.id, ids))),
    db
      .select({ quote: priceQuotes, supplier: { id: suppliers.id, name: suppliers.name, leadTimeDays: suppliers.leadTimeDays } })
      .from(priceQuotes)
      .innerJoin(suppliers, and(eq(suppliers.id, priceQuotes.supplierId), isNull(suppliers.archivedAt)))
      .where(and(eq(priceQuotes.workspaceId, workspaceId), inArray(priceQuotes.ingredientId, ids))),
  ]);
  const lots = found.some((f) => f.kind === "nibs") ? (await listNibSources({ workspaceId })).map(optionFromLot) : [];
  const ctx = { base: baseCurrency, rates, on };
  for (const ingredient of found) {
    const bySupplier = new Map<string, typeof quotes>();
    for (const q of quotes) {
      if (q.quote.ingredientId !== ingredient.id) continue;
      bySupplier.set(q.supplier.id, [...(bySupplier.get(q.supplier.id) ?? []), q]);
    }
    const options: PriceOption[] = [];
    for (const group of bySupplier.values()) {
      const current = currentQuote(group.map((g) => g.quote), on);
      if (!current) continue;
      const quote = { ...current, price: plain(current.price), packKg: plain(current.packKg), minimumOrderKg: plain(current.minimumOrderKg) };
      options.push(optionFromQuote(group[0]!.supplier, quote, ctx));
    }
    options.sort((a, b) => a.label.localeCompare(b.label));
    sources.set(ingredient.id, {
      ingredientId: ingredient.id,
      name: ingredient.name,
      kind: ingredient.kind,
      preferredKey: ingredient.preferredId ? supplierKey(ingredient.preferredId) : null,
      preferredSupplierName: ingredient.preferredName,
      options: ingredient.kind === "nibs" ? [...options, ...lots] : options,
    });
  }
  return { baseCurrency, sources };
}
