import "server-only";
import { and, asc, desc, eq } from "drizzle-orm";
import { db } from "@/db/client";
import {
  purchaseOrderBatches,
  purchaseOrderLines,
  purchaseOrders,
  suppliers,
  users,
  type PurchaseOrderStatus,
  type PriceUnit,
} from "@/db/schema";
import { invalid, notFound } from "@/lib/errors";
import { lineAmount, totalsByCurrency } from "@/lib/purchasing/order-quantity";
import { materialRequirements } from "./requirements";
import { plain } from "./numeric";
import { insertWithNextCode } from "./sequence-code";

export type OrderLine = {
  id: string;
  position: number;
  ingredientId: string;
  ingredientName: string;
  neededKg: string;
  quantityKg: string;
  packKg: string | null;
  packs: number | null;
  minimumOrderKg: string | null;
  price: string | null;
  currency: string | null;
  priceUnit: PriceUnit | null;
  amount: string | null;
};

export type OrderDetail = {
  id: string;
  number: string;
  status: PurchaseOrderStatus;
  supplierId: string;
  supplierName: string;
  supplierEmail: string | null;
  notes: string | null;
  createdByName: string | null;
  createdAt: Date;
  sentAt: Date | null;
  sentTo: string | null;
  receivedOn: string | null;
  cancelledAt: Date | null;
  lines: OrderLine[];
  totals: Record<string, string>;
  batchIds: string[];
};

/**
 * Drafts an order to one supplier for what the chosen planned batches still
 * lack (material requirements: needed − on hand − on order), each line rounded
 * up to the supplier's packs and minimum order, priced from the current quote.
 */
export async function draftPurchaseOrder({
  workspaceId,
  userId,
  supplierId,
  batchIds,
  now = new Date(),
}: {
  workspaceId: string;
  userId: string | null;
  supplierId: string;
  batchIds: readonly string[];
  now?: Date;
}): Promise<{ id: string; number: string }> {
  const [supplier] = await db
    .select({ id: suppliers.id, name: suppliers.name })
    .from(suppliers)
    .where(and(eq(suppliers.workspaceId, workspaceId), eq(suppliers.id, supplierId)));
  if (!supplier) throw notFound("That supplier");
  const req = await materialRequirements({ workspaceId, batchIds });
  if (req.batchIds.length === 0) throw invalid("None of those batches is planned any more. Reload the page.");
  const lines = (req.groups.find((g) => g.supplierId === supplierId)?.lines ?? []).filter((l) => Number(l.order.quantityKg) > 0);
  if (lines.length === 0) throw invalid(`Nothing to order from ${supplier.name}: stock on hand and open orders cover these batches.`);
  return db.transaction((tx) =>
    insertWithNextCode({
      executor: tx,
      table: purchaseOrders,
      workspaceColumn: purchaseOrders.workspaceId,
      codeColumn: purchaseOrders.number,
      constraint: "purchase_orders_workspace_number",
      workspaceId,
      prefix: "PO",
      year: now.getUTCFullYear(),
      insert: async (number, sp) => {
        const [order] = await sp
          .insert(purchaseOrders)
          .values({ workspaceId, number, supplierId, createdById: userId })
          .returning({ id: purchaseOrders.id });
        await sp.insert(purchaseOrderLines).values(
          lines.map((l, i) => ({
            orderId: order!.id,
            position: i + 1,
            ingredientId: l.ingredientId,
            ingredientName: l.ingredientName,
            neededKg: l.shortKg,
            quantityKg: l.order.quantityKg,
            packKg: l.quote?.packKg ?? null,
            packs: l.order.packs,
            minimumOrderKg: l.quote?.minimumOrderKg ?? null,
            price: l.quote?.price ?? null,
            currency: l.quote?.currency ?? null,
            priceUnit: l.quote?.unit ?? null,
            quoteId: l.quote?.id ?? null,
          })),
        );
        await sp.insert(purchaseOrderBatches).values(req.batchIds.map((batchId) => ({ orderId: order!.id, batchId })));
        return { id: order!.id, number };
      },
    }),
  );
}

export type OrderListRow = { id: string; number: string; status: PurchaseOrderStatus; supplierName: string; createdAt: Date; sentAt: Date | null; receivedOn: string | null };

/** The columns of an order in a list (join `suppliers` on the order's supplier). */
export const orderListColumns = {
  id: purchaseOrders.id,
  number: purchaseOrders.number,
  status: purchaseOrders.status,
  supplierName: suppliers.name,
  createdAt: purchaseOrders.createdAt,
  sentAt: purchaseOrders.sentAt,
  receivedOn: purchaseOrders.receivedOn,
};

export async function listPurchaseOrders({ workspaceId, limit = 200 }: { workspaceId: string; limit?: number }): Promise<OrderListRow[]> {
  return db
    .select(orderListColumns)
    .from(purchaseOrders)
    .innerJoin(suppliers, eq(suppliers.id, purchaseOrders.supplierId))
    .where(eq(purchaseOrders.workspaceId, workspaceId))
    .orderBy(desc(purchaseOrders.createdAt), desc(purchaseOrders.number))
    .limit(limit);
}

/** One order with its lines and totals, or not found (also for another workspace's). */
export async function getPurchaseOrder({ workspaceId, orderId }: { workspaceId: string; orderId: string }): Promise<OrderDetail> {
  const [row] = await db
    .select({ order: purchaseOrders, supplierName: suppliers.name, supplierEmail: suppliers.email, createdByName: users.name })
    .from(purchaseOrders)
    .innerJoin(suppliers, eq(suppliers.id, purchaseOrders.supplierId))
    .leftJoin(users, eq(users.id, purchaseOrders.createdById))
    .where(and(eq(purchaseOrders.workspaceId, workspaceId), eq(purchaseOrders.id, orderId)));
  if (!row) throw notFound("That purchase order");
  const [lines, links] = await Promise.all([
    db.select().from(purchaseOrderLines).where(eq(purchaseOrderLines.orderId, orderId)).orderBy(asc(purchaseOrderLines.position)),
    db.select({ batchId: purchaseOrderBatches.batchId }).from(purchaseOrderBatches).where(eq(purchaseOrderBatches.orderId, orderId)),
  ]);
  const shaped: OrderLine[] = lines.map((l) => {
    const packKg = plain(l.packKg);
    const quantityKg = plain(l.quantityKg);
    const price = plain(l.price);
    return {
      id: l.id,
      position: l.position,
      ingredientId: l.ingredientId,
      ingredientName: l.ingredientName,
      neededKg: plain(l.neededKg),
      quantityKg,
      packKg,
      packs: l.packs,
      minimumOrderKg: plain(l.minimumOrderKg),
      price,
      currency: l.currency,
      priceUnit: l.priceUnit,
      amount: lineAmount({ quantityKg, price, unit: l.priceUnit, packKg }),
    };
  });
  const { order } = row;
  return {
    id: order.id,
    number: order.number,
    status: order.status,
    supplierId: order.supplierId,
    supplierName: row.supplierName,
    supplierEmail: row.supplierEmail,
    notes: order.notes,
    createdByName: row.createdByName,
    createdAt: order.createdAt,
    sentAt: order.sentAt,
    sentTo: order.sentTo,
    receivedOn: order.receivedOn,
    cancelledAt: order.cancelledAt,
    lines: shaped,
    totals: totalsByCurrency(shaped),
    batchIds: links.map((l) => l.batchId),
  };
}
