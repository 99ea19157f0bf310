import { char, date, index, integer, pgEnum, pgTable, primaryKey, text, timestamp, unique, uuid } from "drizzle-orm/pg-core";
import { batches, productionRuns } from "./batches";
import { createdAt, kilograms, money, updatedAt } from "./columns";
import { ingredients } from "./ingredients";
import { priceQuotes, priceUnitEnum } from "./prices";
import { suppliers } from "./suppliers";
import { users } from "./users";
import { workspaces } from "./workspaces";

export const purchaseOrderStatuses = ["drafted", "sent", "received", "cancelled"] as const;
export type PurchaseOrderStatus = (typeof purchaseOrderStatuses)[number];
export const purchaseOrderStatusEnum = pgEnum("purchase_order_status", purchaseOrderStatuses);

/** An order to one supplier. Drafted → sent → received; drafted or sent → cancelled. */
export const purchaseOrders = pgTable(
  "purchase_orders",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    workspaceId: uuid("workspace_id")
      .notNull()
      .references(() => workspaces.id, { onDelete: "cascade" }),
    number: text("number").notNull(),
    supplierId: uuid("supplier_id")
      .notNull()
      .references(() => suppliers.id, { onDelete: "restrict" }),
    status: purchaseOrderStatusEnum("status").notNull().default("drafted"),
    notes: text("notes"),
    createdById: uuid("created_by_id").references(() => users.id, { onDelete: "set null" }),
    sentAt: timestamp("sent_at", { withTimezone: true, mode: "date" }),
    sentTo: text("sent_to"),
    receivedOn: date("received_on", { mode: "string" }),
    cancelledAt: timestamp("cancelled_at", { withTimezone: true, mode: "date" }),
    createdAt: createdAt(),
    updatedAt: updatedAt(),
  },
  (t) => [
    unique("purchase_orders_workspace_number").on(t.workspaceId, t.number),
    index("purchase_orders_workspace_idx").on(t.workspaceId, t.createdAt),
    index("purchase_orders_supplier_idx").on(t.supplierId),
  ],
);

export type PurchaseOrder = typeof purchaseOrders.$inferSelect;

/**
 * A line of an order: what was short, what is ordered (rounded up to packs and
 * the minimum order), and the quote's price as it was when drafted.
 */
export const purchaseOrderLines = pgTable(
  "purchase_order_lines",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    orderId: uuid("order_id")
      .notNull()
      .references(() => purchaseOrders.id, { onDelete: "cascade" }),
    position: integer("position").notNull(),
    ingredientId: uuid("ingredient_id")
      .notNull()
      .references(() => ingredients.id, { onDelete: "restrict" }),
    ingredientName: text("ingredient_name").notNull(),
    neededKg: kilograms("needed_kg").notNull(),
    quantityKg: kilograms("quantity_kg").notNull(),
    packKg: kilograms("pack_kg"),
    packs: integer("packs"),
    minimumOrderKg: kilograms("minimum_order_kg"),
    price: money("price"),
    currency: char("currency", { length: 3 }),
    priceUnit: priceUnitEnum("price_unit"),
    quoteId: uuid("quote_id").references(() => priceQuotes.id, { onDelete: "set null" }),
  },
  (t) => [unique("purchase_order_lines_position").on(t.orderId, t.position), index("purchase_order_lines_ingredient_idx").on(t.ingredientId)],
);

export type PurchaseOrderLine = typeof purchaseOrderLines.$inferSelect;

/** The planned batches an order was drafted for. */
export const purchaseOrderBatches = pgTable(
  "purchase_order_batches",
  {
    orderId: uuid("order_id")
      .notNull()
      .references(() => purchaseOrders.id, { onDelete: "cascade" }),
    batchId: uuid("batch_id")
      .notNull()
      .references(() => batches.id, { onDelete: "cascade" }),
  },
  (t) => [primaryKey({ columns: [t.orderId, t.batchId] }), index("purchase_order_batches_batch_idx").on(t.batchId)],
);

export const stockMovementKinds = ["opening", "received", "used"] as const;
export type StockMovementKind = (typeof stockMovementKinds)[number];
export const stockMovementKindEnum = pgEnum("stock_movement_kind", stockMovementKinds);

/**
 * Ingredient stock as an insert-only ledger: in (opening stock, a received
 * order) positive, out (used in a run) negative. Stock on hand is the sum.
 * Nibs made from the workspace's own bean lots are counted from the lots instead.
 */
export const stockMovements = pgTable(
  "stock_movements",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    workspaceId: uuid("workspace_id")
      .notNull()
      .references(() => workspaces.id, { onDelete: "cascade" }),
    ingredientId: uuid("ingredient_id")
      .notNull()
      .references(() => ingredients.id, { onDelete: "restrict" }),
    kind: stockMovementKindEnum("kind").notNull(),
    massKg: kilograms("mass_kg").notNull(),
    orderId: uuid("order_id").references(() => purchaseOrders.id, { onDelete: "set null" }),
    runId: uuid("run_id").references(() => productionRuns.id, { onDelete: "set null" }),
    note: text("note"),
    createdAt: createdAt(),
  },
  (t) => [index("stock_movements_ingredient_idx").on(t.workspaceId, t.ingredientId)],
);

export type StockMovement = typeof stockMovements.$inferSelect;
