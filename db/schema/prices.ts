import { char, date, index, numeric, pgEnum, pgTable, text, unique, uuid } from "drizzle-orm/pg-core";
import { createdAt, kilograms, money } from "./columns";
import { ingredients } from "./ingredients";
import { suppliers } from "./suppliers";
import { users } from "./users";
import { workspaces } from "./workspaces";

export const priceUnits = ["per_kg", "per_pack", "per_tonne"] as const;
export type PriceUnit = (typeof priceUnits)[number];
export const priceUnitEnum = pgEnum("price_unit", priceUnits);

/**
 * A supplier's price for an ingredient, valid over a period. Insert-only: a new
 * price is a new row, so history is never overwritten. `dedupeKey` makes the
 * same quote (e.g. from re-uploading a price list) insert only once.
 */
export const priceQuotes = pgTable(
  "price_quotes",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    workspaceId: uuid("workspace_id")
      .notNull()
      .references(() => workspaces.id, { onDelete: "cascade" }),
    supplierId: uuid("supplier_id")
      .notNull()
      .references(() => suppliers.id, { onDelete: "restrict" }),
    ingredientId: uuid("ingredient_id")
      .notNull()
      .references(() => ingredients.id, { onDelete: "restrict" }),
    price: money("price").notNull(),
    currency: char("currency", { length: 3 }).notNull(),
    unit: priceUnitEnum("unit").notNull(),
    /** Pack size for `per_pack` prices. */
    packKg: kilograms("pack_kg"),
    minimumOrderKg: kilograms("minimum_order_kg"),
    validFrom: date("valid_from", { mode: "string" }).notNull(),
    validUntil: date("valid_until", { mode: "string" }),
    /** "manual" or the price-list upload it came from. */
    source: text("source").notNull().default("manual"),
    dedupeKey: text("dedupe_key").notNull(),
    createdById: uuid("created_by_id").references(() => users.id, { onDelete: "set null" }),
    createdAt: createdAt(),
  },
  (t) => [
    unique("price_quotes_workspace_dedupe").on(t.workspaceId, t.dedupeKey),
    index("price_quotes_ingredient_idx").on(t.ingredientId, t.validFrom),
    index("price_quotes_supplier_idx").on(t.supplierId),
  ],
);

export type PriceQuote = typeof priceQuotes.$inferSelect;
export type NewPriceQuote = typeof priceQuotes.$inferInsert;

/**
 * Dated exchange rates entered by the buyer: one unit of `currency` is worth
 * `rateToBase` units of the workspace's base currency from `validOn` onwards.
 */
export const exchangeRates = pgTable(
  "exchange_rates",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    workspaceId: uuid("workspace_id")
      .notNull()
      .references(() => workspaces.id, { onDelete: "cascade" }),
    currency: char("currency", { length: 3 }).notNull(),
    rateToBase: numeric("rate_to_base", { precision: 20, scale: 10 }).notNull(),
    validOn: date("valid_on", { mode: "string" }).notNull(),
    createdById: uuid("created_by_id").references(() => users.id, { onDelete: "set null" }),
    createdAt: createdAt(),
  },
  (t) => [unique("exchange_rates_workspace_currency_day").on(t.workspaceId, t.currency, t.validOn)],
);

export type ExchangeRate = typeof exchangeRates.$inferSelect;
