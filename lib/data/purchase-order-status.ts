import "server-only";
import Decimal from "decimal.js";
import { and, eq } from "drizzle-orm";
import { db } from "@/db/client";
import { priceQuotes, purchaseOrderLines, purchaseOrders, stockMovements, workspaces } from "@/db/schema";
import { conflict, invalid, notFound } from "@/lib/errors";
import { sendMail } from "@/lib/mail/mailer";
import { orderCsv, orderFileName, orderMailText } from "@/lib/purchasing/order-document";
import { quoteDedupeKey } from "@/lib/pricing/dedupe-key";
import type { Executor } from "./recipes-db";
import { getPurchaseOrder } from "./purchase-orders";

type Who = { workspaceId: string; orderId: string };

/** Locks the order's row for the rest of the transaction and checks its status. */
async function lockOrder(tx: Executor, { workspaceId, orderId }: Who, allowed: readonly string[], verb: string) {
  const [row] = await tx
    .select({ id: purchaseOrders.id, number: purchaseOrders.number, status: purchaseOrders.status })
    .from(purchaseOrders)
    .where(and(eq(purchaseOrders.workspaceId, workspaceId), eq(purchaseOrders.id, orderId)))
    .for("update");
  if (!row) throw notFound("That purchase order");
  if (!allowed.includes(row.status)) throw conflict(`${row.number} is ${row.status}; it cannot be ${verb}.`);
  return row;
}

/** Changes a drafted order's quantities and prices; a quantity of 0 leaves the line out. */
export async function updatePurchaseOrder({
  workspaceId,
  orderId,
  notes,
  lines,
}: Who & { notes: string | null; lines: ReadonlyArray<{ lineId: string; quantityKg: string; price: string | null }> }): Promise<void> {
  await db.transaction(async (tx) => {
    await lockOrder(tx, { workspaceId, orderId }, ["drafted"], "changed");
    const current = await tx.select().from(purchaseOrderLines).where(eq(purchaseOrderLines.orderId, orderId));
    const errors: Record<string, string[]> = {};
    lines.forEach((l, i) => {
      const line = current.find((c) => c.id === l.lineId);
      if (!line) return void (errors[`lines.${i}.lineId`] = ["That line is not part of this order. Reload the page."]);
      const qty = new Decimal(l.quantityKg);
      if (qty.gt(0) && line.packKg && !qty.div(line.packKg).isInteger()) {
        errors[`lines.${i}.quantityKg`] = [`Order whole packs of ${new Decimal(line.packKg).toFixed()} kg.`];
      } else if (qty.gt(0) && line.minimumOrderKg && qty.lt(line.minimumOrderKg)) {
        errors[`lines.${i}.quantityKg`] = [`The minimum order is ${new Decimal(line.minimumOrderKg).toFixed()} kg.`];
      }
    });
    if (Object.keys(errors).length) throw invalid("Check the highlighted fields.", errors);
    for (const l of lines) {
      const line = current.find((c) => c.id === l.lineId)!;
      const packs = line.packKg ? new Decimal(l.quantityKg).div(line.packKg).toNumber() : null;
      await tx
        .update(purchaseOrderLines)
        .set({ quantityKg: l.quantityKg, packs, price: l.price ?? line.price })
        .where(eq(purchaseOrderLines.id, line.id));
    }
    await tx.update(purchaseOrders).set({ notes }).where(eq(purchaseOrders.id, orderId));
  });
}

/**
 * Sends a drafted order to the supplier's e-mail address with the order as a
 * CSV attachment, then marks it sent. The row stays locked while the mail
 * goes out, so a double click sends once; a mail failure leaves it drafted.
 */
export async function sendPurchaseOrder({ workspaceId, orderId, now = new Date() }: Who & { now?: Date }): Promise<{ sentTo: string }> {
  return db.transaction(async (tx) => {
    await lockOrder(tx, { workspaceId, orderId }, ["drafted"], "sent");
    const order = await getPurchaseOrder({ workspaceId, orderId });
    if (!order.supplierEmail) throw invalid(`${order.supplierName} has no e-mail address. Add one on the supplier's page, then send.`);
    if (!order.lines.some((l) => new Decimal(l.quantityKg).gt(0))) throw invalid("Every line has a quantity of 0: there is nothing to order.");
    const [ws] = await tx.select({ name: workspaces.name }).from(workspaces).where(eq(workspaces.id, workspaceId));
    await sendMail({
      to: order.supplierEmail,
      subject: `Purchase order ${order.number} from ${ws?.name ?? "Barwright"}`,
      text: orderMailText(order, ws?.name ?? "Barwright"),
      attachments: [{ filename: orderFileName(order), content: orderCsv(order), contentType: "text/csv; charset=utf-8" }],
    });
    await tx.update(purchaseOrders).set({ status: "sent", sentAt: now, sentTo: order.supplierEmail }).where(eq(purchaseOrders.id, orderId));
    return { sentTo: order.supplierEmail };
  });
}

/**
 * Receives a sent order on a day: each line's quantity goes into ingredient
 * stock, and each priced line becomes a quote from that day (the price paid is
 * the supplier's latest price), recorded once however often this runs.
 */
export async function receivePurchaseOrder({ workspaceId, orderId, userId, receivedOn }: Who & { userId: string | null; receivedOn: string }): Promise<void> {
  await db.transaction(async (tx) => {
    const row = await lockOrder(tx, { workspaceId, orderId }, ["sent"], "received");
    const order = await getPurchaseOrder({ workspaceId, orderId });
    for (const l of order.lines) {
      if (!new Decimal(l.quantityKg).gt(0)) continue;
      await tx.insert(stockMovements).values({ workspaceId, ingredientId: l.ingredientId, kind: "received", massKg: l.quantityKg, orderId, note: `Received on ${row.number}` });
      if (l.price && l.currency && l.priceUnit) {
        const q = {
          supplierId: order.supplierId,
          ingredientId: l.ingredientId,
          price: l.price,
          currency: l.currency,
          unit: l.priceUnit,
          packKg: l.packKg,
          minimumOrderKg: l.minimumOrderKg,
          validFrom: receivedOn,
          validUntil: null,
        };
        await tx
          .insert(priceQuotes)
          .values({ workspaceId, ...q, source: `purchase order ${row.number}`, dedupeKey: quoteDedupeKey(q), createdById: userId })
          .onConflictDoNothing({ target: [priceQuotes.workspaceId, priceQuotes.dedupeKey] });
      }
    }
    await tx.update(purchaseOrders).set({ status: "received", receivedOn }).where(eq(purchaseOrders.id, orderId));
  });
}

/** Cancels a drafted or sent order (a sent one: tell the supplier too). */
export async function cancelPurchaseOrder({ workspaceId, orderId, now = new Date() }: Who & { now?: Date }): Promise<void> {
  await db.transaction(async (tx) => {
    await lockOrder(tx, { workspaceId, orderId }, ["drafted", "sent"], "cancelled");
    await tx.update(purchaseOrders).set({ status: "cancelled", cancelledAt: now }).where(eq(purchaseOrders.id, orderId));
  });
}
