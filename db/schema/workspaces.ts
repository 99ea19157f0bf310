import { boolean, char, numeric, pgTable, text, timestamp, uuid } from "drizzle-orm/pg-core";

/** A chocolate business's space: every business row belongs to exactly one. */
export const workspaces = pgTable("workspaces", {
  id: uuid("id").primaryKey().defaultRandom(),
  name: text("name").notNull(),
  slug: text("slug").notNull().unique(),
  baseCurrency: char("base_currency", { length: 3 }).notNull().default("EUR"),
  /**
   * Nib yield from raw beans assumed for a lot whose processing is not recorded
   * yet: 78 %, inside the 75–82 % range of common practice (no single source).
   */
  estimatedNibYieldPercent: numeric("estimated_nib_yield_percent", { precision: 6, scale: 3 }).notNull().default("78"),
  /** Let production and viewers see costs and prices on the costing pages (the owner decides; off by default). */
  showCostsToAll: boolean("show_costs_to_all").notNull().default(false),
  createdAt: timestamp("created_at", { withTimezone: true }).notNull().defaultNow(),
});

export type Workspace = typeof workspaces.$inferSelect;
export type NewWorkspace = typeof workspaces.$inferInsert;
