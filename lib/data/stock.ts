import "server-only";
import Decimal from "decimal.js";
import { and, eq, inArray, sql } from "drizzle-orm";
import { db } from "@/db/client";
import { ingredients, purchaseOrderLines, purchaseOrders, stockMovements } from "@/db/schema";
import { getNibStock } from "./nib-stock";

export type StockFigure = { onHandKg: string; onOrderKg: string; fromLots: boolean };

const plainKg = (d: Decimal) => (d.isZero() ? "0" : d.toFixed());

/**
 * Stock on hand and on order per ingredient, in kg. On hand is the ingredient's
 * stock ledger (opening stock + received orders − what runs used); nibs also
 * count every bean lot's nibs in stock. On order is what drafted and sent
 * orders still bring.
 */
export async function stockFigures({ workspaceId, ingredientIds }: { workspaceId: string; ingredientIds: readonly string[] }): Promise<Map<string, StockFigure>> {
  const ids = [...new Set(ingredientIds)];
  const out = new Map<string, StockFigure>();
  if (ids.length === 0) return out;
  const [ledger, ordered, kinds, lots] = await Promise.all([
    db
      .select({ ingredientId: stockMovements.ingredientId, kg: sql<string>`sum(${stockMovements.massKg})` })
      .from(stockMovements)
      .where(and(eq(stockMovements.workspaceId, workspaceId), inArray(stockMovements.ingredientId, ids)))
      .groupBy(stockMovements.ingredientId),
    db
      .select({ ingredientId: purchaseOrderLines.ingredientId, kg: sql<string>`sum(${purchaseOrderLines.quantityKg})` })
      .from(purchaseOrderLines)
      .innerJoin(purchaseOrders, eq(purchaseOrders.id, purchaseOrderLines.orderId))
      .where(and(eq(purchaseOrders.workspaceId, workspaceId), inArray(purchaseOrders.status, ["drafted", "sent"]), inArray(purchaseOrderLines.ingredientId, ids)))
      .groupBy(purchaseOrderLines.ingredientId),
    db.select({ id: ingredients.id, kind: ingredients.kind }).from(ingredients).where(and(eq(ingredients.workspaceId, workspaceId), inArray(ingredients.id, ids))),
    getNibStock({ workspaceId }),
  ]);
  const lotNibs = [...lots.values()].reduce((s, l) => s.plus(l.inStockKg), new Decimal(0));
  const ledgerBy = new Map(ledger.map((r) => [r.ingredientId, new Decimal(r.kg)]));
  const orderedBy = new Map(ordered.map((r) => [r.ingredientId, new Decimal(r.kg)]));
  const kindBy = new Map(kinds.map((k) => [k.id, k.kind]));
  for (const id of ids) {
    const fromLots = kindBy.get(id) === "nibs";
    const onHand = (ledgerBy.get(id) ?? new Decimal(0)).plus(fromLots ? lotNibs : 0);
    out.set(id, { onHandKg: plainKg(onHand), onOrderKg: plainKg(orderedBy.get(id) ?? new Decimal(0)), fromLots });
  }
  return out;
}
