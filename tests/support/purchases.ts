/** Purchase-order fixtures: a supplier with an e-mail address and an order written straight to the database. */
import { randomBytes } from "node:crypto";
import { eq } from "drizzle-orm";
import { db } from "@/db/client";
import { purchaseOrderLines, purchaseOrders, suppliers, type PurchaseOrderStatus } from "@/db/schema";
import { makeIngredient, makeSupplier } from "./ingredients";

export async function supplierWithEmail(workspaceId: string) {
  const s = await makeSupplier(workspaceId);
  const email = `orders-${randomBytes(3).toString("hex")}@supplier.example`;
  await db.update(suppliers).set({ email }).where(eq(suppliers.id, s.id));
  return { ...s, email };
}

/** An order of 10 kg of a fresh ingredient at EUR 2.5 per kg, in the given status. */
export async function insertTestOrder(workspaceId: string, status: PurchaseOrderStatus = "drafted") {
  const supplier = await supplierWithEmail(workspaceId);
  const ingredient = await makeIngredient(workspaceId);
  const [order] = await db
    .insert(purchaseOrders)
    .values({ workspaceId, number: `PO-T-${randomBytes(3).toString("hex")}`, supplierId: supplier.id, status })
    .returning({ id: purchaseOrders.id, number: purchaseOrders.number });
  const [line] = await db
    .insert(purchaseOrderLines)
    .values({ orderId: order!.id, position: 1, ingredientId: ingredient.id, ingredientName: ingredient.name, neededKg: "9.2", quantityKg: "10", price: "2.5", currency: "EUR", priceUnit: "per_kg" })
    .returning({ id: purchaseOrderLines.id });
  return { ...order!, lineId: line!.id, supplier, ingredient };
}
