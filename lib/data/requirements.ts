import "server-only";
import Decimal from "decimal.js";
import { and, eq, inArray, sql } from "drizzle-orm";
import { db } from "@/db/client";
import { batches, batchLines, ingredients, priceQuotes, suppliers, type IngredientKind, type PriceUnit } from "@/db/schema";
import { lineAmount, orderQuantity } from "@/lib/purchasing/order-quantity";
import { currentQuote, isoDay } from "@/lib/pricing/convert";
import { plain } from "./numeric";
import { stockFigures } from "./stock";

export type RequirementQuote = { id: string; price: string; currency: string; unit: PriceUnit; packKg: string | null; minimumOrderKg: string | null };

export type RequirementLine = {
  ingredientId: string;
  ingredientName: string;
  kind: IngredientKind;
  neededKg: string;
  onHandKg: string;
  onOrderKg: string;
  /** needed − on hand − on order, never below 0. */
  shortKg: string;
  fromLots: boolean;
  quote: RequirementQuote | null;
  order: { quantityKg: string; packs: number | null };
  amount: string | null;
};

export type SupplierGroup = { supplierId: string | null; supplierName: string | null; supplierEmail: string | null; lines: RequirementLine[] };

const out = (d: Decimal) => (d.isZero() ? "0" : d.toFixed());

/**
 * Material requirements of planned batches: each ingredient's total mass over
 * the batches (their stored plan masses), against stock on hand and on order,
 * grouped by the ingredient's preferred supplier, with what to order rounded
 * up to that supplier's current quote's packs and minimum order. Batches that
 * are not planned (completed, cancelled) or not this workspace's are ignored.
 */
export async function materialRequirements({
  workspaceId,
  batchIds,
  on = isoDay(new Date()),
}: {
  workspaceId: string;
  batchIds: readonly string[];
  on?: string;
}): Promise<{ batchIds: string[]; groups: SupplierGroup[] }> {
  if (batchIds.length === 0) return { batchIds: [], groups: [] };
  const needed = await db
    .select({ ingredientId: batchLines.ingredientId, grams: sql<string>`sum(${batchLines.massGrams})`, batchIds: sql<string[]>`array_agg(distinct ${batches.id})` })
    .from(batchLines)
    .innerJoin(batches, eq(batches.id, batchLines.batchId))
    .where(and(eq(batches.workspaceId, workspaceId), eq(batches.status, "planned"), inArray(batches.id, [...batchIds])))
    .groupBy(batchLines.ingredientId);
  if (needed.length === 0) return { batchIds: [], groups: [] };
  const ids = needed.map((n) => n.ingredientId);
  const [library, quotes, stock] = await Promise.all([
    db
      .select({ id: ingredients.id, name: ingredients.name, kind: ingredients.kind, supplierId: ingredients.preferredSupplierId, supplierName: suppliers.name, supplierEmail: suppliers.email })
      .from(ingredients)
      .leftJoin(suppliers, eq(suppliers.id, ingredients.preferredSupplierId))
      .where(and(eq(ingredients.workspaceId, workspaceId), inArray(ingredients.id, ids))),
    db
      .select()
      .from(priceQuotes)
      .innerJoin(ingredients, and(eq(ingredients.id, priceQuotes.ingredientId), eq(ingredients.preferredSupplierId, priceQuotes.supplierId)))
      .where(and(eq(priceQuotes.workspaceId, workspaceId), inArray(priceQuotes.ingredientId, ids))),
    stockFigures({ workspaceId, ingredientIds: ids }),
  ]);
  const groups = new Map<string, SupplierGroup>();
  for (const n of needed) {
    const ing = library.find((l) => l.id === n.ingredientId);
    if (!ing) continue;
    const s = stock.get(n.ingredientId)!;
    const neededKg = new Decimal(n.grams).div(1000);
    const short = Decimal.max(0, neededKg.minus(s.onHandKg).minus(s.onOrderKg));
    const q = currentQuote(quotes.filter((r) => r.price_quotes.ingredientId === n.ingredientId).map((r) => r.price_quotes), on);
    const quote: RequirementQuote | null = q
      ? { id: q.id, price: plain(q.price), currency: q.currency, unit: q.unit, packKg: plain(q.packKg), minimumOrderKg: plain(q.minimumOrderKg) }
      : null;
    const order = orderQuantity({ neededKg: out(short), packKg: quote?.packKg, minimumOrderKg: quote?.minimumOrderKg });
    const key = ing.supplierId ?? "none";
    const group = groups.get(key) ?? { supplierId: ing.supplierId, supplierName: ing.supplierName, supplierEmail: ing.supplierEmail, lines: [] };
    group.lines.push({
      ingredientId: ing.id,
      ingredientName: ing.name,
      kind: ing.kind,
      neededKg: out(neededKg),
      onHandKg: s.onHandKg,
      onOrderKg: s.onOrderKg,
      shortKg: out(short),
      fromLots: s.fromLots,
      quote,
      order,
      amount: quote ? lineAmount({ quantityKg: order.quantityKg, price: quote.price, unit: quote.unit, packKg: quote.packKg }) : null,
    });
    groups.set(key, group);
  }
  const planned = [...new Set(needed.flatMap((n) => n.batchIds))];
  const sorted = [...groups.values()].sort((a, b) => (a.supplierName ?? "\uffff").localeCompare(b.supplierName ?? "\uffff"));
  for (const g of sorted) g.lines.sort((a, b) => a.ingredientName.localeCompare(b.ingredientName));
  return { batchIds: planned, groups: sorted };
}
