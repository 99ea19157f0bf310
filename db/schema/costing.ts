import { sql } from "drizzle-orm";
import { char, check, index, integer, numeric, pgTable, text, unique, uuid } from "drizzle-orm/pg-core";
import { createdAt, kilograms, money, updatedAt } from "./columns";
import { ingredients } from "./ingredients";
import { beanLots } from "./lots";
import { recipes } from "./recipes";
import { suppliers } from "./suppliers";
import { users } from "./users";
import { workspaces } from "./workspaces";

const percent = (name: string) => numeric(name, { precision: 7, scale: 4 });

/**
 * A recipe's cost model beyond its ingredients: process loss, packaging, labour,
 * overhead, case size, target margins and selling prices. One set per recipe,
 * applied to whichever version is costed (these describe how the bar is made
 * and sold, not what is in it; the bar mass comes from the version). Insert-only:
 * a change is a new revision, so who changed packaging from what to what stays
 * readable. Money is in `currency`, the base currency when the row was written.
 */
export const recipeCostSettings = pgTable(
  "recipe_cost_settings",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    workspaceId: uuid("workspace_id")
      .notNull()
      .references(() => workspaces.id, { onDelete: "cascade" }),
    recipeId: uuid("recipe_id")
      .notNull()
      .references(() => recipes.id, { onDelete: "cascade" }),
    revision: integer("revision").notNull(),
    currency: char("currency", { length: 3 }).notNull(),
    processLossPercent: percent("process_loss_percent").notNull().default("0"),
    packagingPerBar: money("packaging_per_bar").notNull().default("0"),
    labourPerBar: money("labour_per_bar").notNull().default("0"),
    labourPerKg: money("labour_per_kg").notNull().default("0"),
    overheadPerBar: money("overhead_per_bar").notNull().default("0"),
    overheadPerKg: money("overhead_per_kg").notNull().default("0"),
    barsPerCase: integer("bars_per_case").notNull().default(1),
    wholesaleMarginPercent: percent("wholesale_margin_percent"),
    retailMarginPercent: percent("retail_margin_percent"),
    wholesalePricePerBar: money("wholesale_price_per_bar"),
    retailPricePerBar: money("retail_price_per_bar"),
    /** Ingredients going into one batch, kg: what minimum orders are compared with. */
    batchKg: kilograms("batch_kg"),
    /** Days within which ingredients must arrive: what lead times are compared with. */
    needWithinDays: integer("need_within_days"),
    note: text("note"),
    createdById: uuid("created_by_id").references(() => users.id, { onDelete: "set null" }),
    createdAt: createdAt(),
  },
  (t) => [
    unique("recipe_cost_settings_revision").on(t.recipeId, t.revision),
    index("recipe_cost_settings_workspace_idx").on(t.workspaceId),
    index("recipe_cost_settings_created_by_idx").on(t.createdById),
  ],
);

export type RecipeCostSettingsRow = typeof recipeCostSettings.$inferSelect;
export type NewRecipeCostSettingsRow = typeof recipeCostSettings.$inferInsert;

/**
 * The buyer's chosen source for an ingredient of a recipe (the "chosen
 * combination"): a supplier's current quote, or a bean lot's nibs. A working
 * choice, changed in place (updated_at says when); no pick = the preferred
 * supplier.
 */
export const recipeCostPicks = pgTable(
  "recipe_cost_picks",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    workspaceId: uuid("workspace_id")
      .notNull()
      .references(() => workspaces.id, { onDelete: "cascade" }),
    recipeId: uuid("recipe_id")
      .notNull()
      .references(() => recipes.id, { onDelete: "cascade" }),
    ingredientId: uuid("ingredient_id")
      .notNull()
      .references(() => ingredients.id, { onDelete: "cascade" }),
    supplierId: uuid("supplier_id").references(() => suppliers.id, { onDelete: "cascade" }),
    lotId: uuid("lot_id").references(() => beanLots.id, { onDelete: "cascade" }),
    updatedById: uuid("updated_by_id").references(() => users.id, { onDelete: "set null" }),
    createdAt: createdAt(),
    updatedAt: updatedAt(),
  },
  (t) => [
    unique("recipe_cost_picks_recipe_ingredient").on(t.recipeId, t.ingredientId),
    check("recipe_cost_picks_one_source", sql`(${t.supplierId} is null) <> (${t.lotId} is null)`),
    index("recipe_cost_picks_workspace_idx").on(t.workspaceId),
    index("recipe_cost_picks_ingredient_idx").on(t.ingredientId),
    index("recipe_cost_picks_supplier_idx").on(t.supplierId),
    index("recipe_cost_picks_lot_idx").on(t.lotId),
    index("recipe_cost_picks_updated_by_idx").on(t.updatedById),
  ],
);

export type RecipeCostPick = typeof recipeCostPicks.$inferSelect;
export type NewRecipeCostPick = typeof recipeCostPicks.$inferInsert;
