import { char, index, integer, pgTable, text, unique, uuid } from "drizzle-orm/pg-core";
import { archivedAt, createdAt, updatedAt } from "./columns";
import { workspaces } from "./workspaces";

/** Who sells to the workspace. Archived, never deleted, once anything refers to it. */
export const suppliers = pgTable(
  "suppliers",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    workspaceId: uuid("workspace_id")
      .notNull()
      .references(() => workspaces.id, { onDelete: "cascade" }),
    name: text("name").notNull(),
    contactName: text("contact_name"),
    email: text("email"),
    currency: char("currency", { length: 3 }).notNull(),
    leadTimeDays: integer("lead_time_days"),
    notes: text("notes"),
    archivedAt: archivedAt(),
    createdAt: createdAt(),
    updatedAt: updatedAt(),
  },
  (t) => [unique("suppliers_workspace_name").on(t.workspaceId, t.name), index("suppliers_workspace_idx").on(t.workspaceId)],
);

export type Supplier = typeof suppliers.$inferSelect;
export type NewSupplier = typeof suppliers.$inferInsert;
