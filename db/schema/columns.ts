import { numeric, timestamp } from "drizzle-orm/pg-core";

/** A composition or nutrient figure in g per 100 g (0–100, four decimals); read as a string. */
export const gramsPer100 = (name: string) => numeric(name, { precision: 8, scale: 4 });

/** Money: up to 10^12 with four decimals, read as a string for decimal.js. */
export const money = (name: string) => numeric(name, { precision: 16, scale: 4 });

/** A mass in kilograms, to the gram. */
export const kilograms = (name: string) => numeric(name, { precision: 14, scale: 3 });

export const createdAt = () => timestamp("created_at", { withTimezone: true, mode: "date" }).notNull().defaultNow();
export const updatedAt = () =>
  timestamp("updated_at", { withTimezone: true, mode: "date" })
    .notNull()
    .defaultNow()
    .$onUpdate(() => new Date());
export const archivedAt = () => timestamp("archived_at", { withTimezone: true, mode: "date" });
