import { char, date, index, integer, numeric, pgEnum, pgTable, text, unique, uuid } from "drizzle-orm/pg-core";
import { archivedAt, createdAt, kilograms, money, updatedAt } from "./columns";
import { suppliers } from "./suppliers";
import { users } from "./users";
import { workspaces } from "./workspaces";

/** A lot of dried cocoa beans as bought: origin, mass, price, condition on arrival. */
export const beanLots = pgTable(
  "bean_lots",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    workspaceId: uuid("workspace_id")
      .notNull()
      .references(() => workspaces.id, { onDelete: "cascade" }),
    code: text("code").notNull(),
    supplierId: uuid("supplier_id").references(() => suppliers.id, { onDelete: "restrict" }),
    originCountry: text("origin_country").notNull(),
    originRegion: text("origin_region"),
    producer: text("producer"),
    harvestYear: integer("harvest_year"),
    arrivedOn: date("arrived_on", { mode: "string" }).notNull(),
    massReceivedKg: kilograms("mass_received_kg").notNull(),
    pricePaid: money("price_paid").notNull(),
    currency: char("currency", { length: 3 }).notNull(),
    moisturePercent: numeric("moisture_percent", { precision: 6, scale: 3 }),
    notes: text("notes"),
    createdById: uuid("created_by_id").references(() => users.id, { onDelete: "set null" }),
    archivedAt: archivedAt(),
    createdAt: createdAt(),
    updatedAt: updatedAt(),
  },
  (t) => [unique("bean_lots_workspace_code").on(t.workspaceId, t.code), index("bean_lots_workspace_idx").on(t.workspaceId)],
);

export type BeanLot = typeof beanLots.$inferSelect;

/** Extra cost lines of a lot (freight, duty, insurance…), in their own currency. */
export const lotCosts = pgTable(
  "lot_costs",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    workspaceId: uuid("workspace_id")
      .notNull()
      .references(() => workspaces.id, { onDelete: "cascade" }),
    lotId: uuid("lot_id")
      .notNull()
      .references(() => beanLots.id, { onDelete: "cascade" }),
    label: text("label").notNull(),
    amount: money("amount").notNull(),
    currency: char("currency", { length: 3 }).notNull(),
    createdAt: createdAt(),
  },
  (t) => [index("lot_costs_lot_idx").on(t.lotId)],
);

/** A cut test: of a sample of beans cut open, how many show each condition. */
export const cutTests = pgTable(
  "cut_tests",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    workspaceId: uuid("workspace_id")
      .notNull()
      .references(() => workspaces.id, { onDelete: "cascade" }),
    lotId: uuid("lot_id")
      .notNull()
      .references(() => beanLots.id, { onDelete: "cascade" }),
    testedOn: date("tested_on", { mode: "string" }).notNull(),
    sampleSize: integer("sample_size").notNull(),
    wellFermented: integer("well_fermented").notNull().default(0),
    partlyFermented: integer("partly_fermented").notNull().default(0),
    slaty: integer("slaty").notNull().default(0),
    mouldy: integer("mouldy").notNull().default(0),
    insectDamaged: integer("insect_damaged").notNull().default(0),
    germinated: integer("germinated").notNull().default(0),
    notes: text("notes"),
    testedById: uuid("tested_by_id").references(() => users.id, { onDelete: "set null" }),
    createdAt: createdAt(),
  },
  (t) => [index("cut_tests_lot_idx").on(t.lotId)],
);

export const processingSteps = ["sorting", "roasting", "winnowing"] as const;
export type ProcessingStep = (typeof processingSteps)[number];
export const processingStepEnum = pgEnum("processing_step", processingSteps);

/**
 * One recorded processing step of a lot: mass in and out, and the step's own
 * figures. Insert-only; `submissionKey` makes a double submit record it once.
 */
export const processingRecords = pgTable(
  "processing_records",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    workspaceId: uuid("workspace_id")
      .notNull()
      .references(() => workspaces.id, { onDelete: "cascade" }),
    lotId: uuid("lot_id")
      .notNull()
      .references(() => beanLots.id, { onDelete: "cascade" }),
    step: processingStepEnum("step").notNull(),
    performedOn: date("performed_on", { mode: "string" }).notNull(),
    performedById: uuid("performed_by_id").references(() => users.id, { onDelete: "set null" }),
    massInKg: kilograms("mass_in_kg").notNull(),
    /** Sorting: beans kept. Roasting: beans after roast. Winnowing: nibs. */
    massOutKg: kilograms("mass_out_kg").notNull(),
    /** Sorting: rejects (flat, broken, mouldy beans, stems, stones). */
    rejectsKg: kilograms("rejects_kg"),
    /** Winnowing: shell (husk). */
    shellKg: kilograms("shell_kg"),
    /** Winnowing: dust and unaccounted loss. */
    dustKg: kilograms("dust_kg"),
    roastTemperatureC: numeric("roast_temperature_c", { precision: 6, scale: 1 }),
    roastMinutes: numeric("roast_minutes", { precision: 6, scale: 1 }),
    ovenLoadKg: kilograms("oven_load_kg"),
    roastPresetId: uuid("roast_preset_id").references(() => roastPresets.id, { onDelete: "set null" }),
    /** Cost of this step (labour, energy) in the workspace's base currency, if entered. */
    cost: money("cost"),
    notes: text("notes"),
    submissionKey: text("submission_key").notNull(),
    createdAt: createdAt(),
  },
  (t) => [
    unique("processing_records_workspace_submission").on(t.workspaceId, t.submissionKey),
    index("processing_records_lot_idx").on(t.lotId),
  ],
);

export type ProcessingRecord = typeof processingRecords.$inferSelect;

/** A named, reusable roast setting. */
export const roastPresets = pgTable(
  "roast_presets",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    workspaceId: uuid("workspace_id")
      .notNull()
      .references(() => workspaces.id, { onDelete: "cascade" }),
    name: text("name").notNull(),
    temperatureC: numeric("temperature_c", { precision: 6, scale: 1 }).notNull(),
    minutes: numeric("minutes", { precision: 6, scale: 1 }).notNull(),
    notes: text("notes"),
    createdAt: createdAt(),
  },
  (t) => [unique("roast_presets_workspace_name").on(t.workspaceId, t.name)],
);

export type RoastPreset = typeof roastPresets.$inferSelect;
