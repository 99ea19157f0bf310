"use server";

import { revalidatePath } from "next/cache";
import { defineAction } from "@/lib/actions/define-action";
import { cancelPurchaseOrder, receivePurchaseOrder, sendPurchaseOrder, updatePurchaseOrder } from "@/lib/data/purchase-order-status";
import { draftPurchaseOrder } from "@/lib/data/purchase-orders";
import { draftOrderSchema, orderIdSchema, receiveOrderSchema, updateOrderSchema } from "@/lib/validation/purchases";

const changed = (orderId?: string) => {
  revalidatePath("/batches/purchase-orders");
  revalidatePath("/batches/requirements");
  if (orderId) revalidatePath(`/batches/purchase-orders/${orderId}`);
};

/** Drafts an order to one supplier for what the chosen planned batches lack. */
export const draftPurchaseOrderAction = defineAction({
  schema: draftOrderSchema,
  permission: "purchases.manage",
  handler: async (input, viewer) => {
    const order = await draftPurchaseOrder({ workspaceId: viewer.workspace.id, userId: viewer.user.id, ...input });
    changed();
    return order;
  },
});

export const updatePurchaseOrderAction = defineAction({
  schema: updateOrderSchema,
  permission: "purchases.manage",
  handler: async (input, viewer) => {
    await updatePurchaseOrder({ workspaceId: viewer.workspace.id, orderId: input.orderId, notes: input.notes, lines: input.lines });
    changed(input.orderId);
  },
});

/** E-mails the order to the supplier with its CSV attached, and marks it sent. */
export const sendPurchaseOrderAction = defineAction({
  schema: orderIdSchema,
  permission: "purchases.manage",
  handler: async (input, viewer) => {
    const sent = await sendPurchaseOrder({ workspaceId: viewer.workspace.id, orderId: input.orderId });
    changed(input.orderId);
    return sent;
  },
});

/** Books a sent order in: stock up, and its prices as the supplier's latest quotes. */
export const receivePurchaseOrderAction = defineAction({
  schema: receiveOrderSchema,
  permission: "purchases.manage",
  handler: async (input, viewer) => {
    await receivePurchaseOrder({ workspaceId: viewer.workspace.id, orderId: input.orderId, userId: viewer.user.id, receivedOn: input.receivedOn });
    changed(input.orderId);
    revalidatePath("/prices");
  },
});

export const cancelPurchaseOrderAction = defineAction({
  schema: orderIdSchema,
  permission: "purchases.manage",
  handler: async (input, viewer) => {
    await cancelPurchaseOrder({ workspaceId: viewer.workspace.id, orderId: input.orderId });
    changed(input.orderId);
  },
});
