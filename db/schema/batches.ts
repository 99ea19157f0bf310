import { boolean, date, index, integer, jsonb, numeric, pgEnum, pgTable, text, timestamp, unique, uuid } from "drizzle-orm/pg-core";
import { archivedAt, createdAt, kilograms, updatedAt } from "./columns";
import { ingredientKindEnum, ingredients } from "./ingredients";
import { beanLots } from "./lots";
import { chocolateTypeEnum, recipes, recipeVersions } from "./recipes";
import { users } from "./users";
import { workspaces } from "./workspaces";

/** A mass in grams, to the milligram (a 0.1 g scale step, a 1,000 t batch). */
const grams = (name: string) => numeric(name, { precision: 18, scale: 3 });

export const machineKinds = ["refiner", "conche", "tempering"] as const;
export type MachineKind = (typeof machineKinds)[number];
export const machineKindEnum = pgEnum("machine_kind", machineKinds);

/** A machine of the workspace: a refiner (stone refiner, melanger), a conche or a tempering machine. */
export const machines = pgTable(
  "machines",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    workspaceId: uuid("workspace_id")
      .notNull()
      .references(() => workspaces.id, { onDelete: "cascade" }),
    name: text("name").notNull(),
    kind: machineKindEnum("kind").notNull(),
    capacityKg: kilograms("capacity_kg").notNull(),
    archivedAt: archivedAt(),
    createdAt: createdAt(),
  },
  (t) => [unique("machines_workspace_name").on(t.workspaceId, t.name), index("machines_workspace_idx").on(t.workspaceId)],
);

export type Machine = typeof machines.$inferSelect;

/** A scale: its step (resolution) in grams and, if known, the most it weighs. */
export const weighingStations = pgTable(
  "weighing_stations",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    workspaceId: uuid("workspace_id")
      .notNull()
      .references(() => workspaces.id, { onDelete: "cascade" }),
    name: text("name").notNull(),
    resolutionGrams: numeric("resolution_grams", { precision: 10, scale: 3 }).notNull(),
    capacityKg: kilograms("capacity_kg"),
    archivedAt: archivedAt(),
    createdAt: createdAt(),
  },
  (t) => [unique("weighing_stations_workspace_name").on(t.workspaceId, t.name), index("weighing_stations_workspace_idx").on(t.workspaceId)],
);

export type WeighingStation = typeof weighingStations.$inferSelect;

export const batchStatuses = ["planned", "completed", "cancelled"] as const;
export type BatchStatus = (typeof batchStatuses)[number];
export const batchStatusEnum = pgEnum("batch_status", batchStatuses);

export const batchMassUnits = ["g", "kg", "t", "bars"] as const;
export type BatchMassUnit = (typeof batchMassUnits)[number];
export const batchMassUnitEnum = pgEnum("batch_mass_unit", batchMassUnits);

/** One machine load as the engine split it: grams per load and per line (in line position order). */
export type StoredLoad = { massGrams: string; lineMassesGrams: string[] };

/**
 * A planned batch of one released recipe version. The plan is a record: the
 * recipe, machine and scale are copied as they were, and the masses are the
 * engine's (scaleBatch) at planning, never recomputed. Only the status changes.
 */
export const batches = pgTable(
  "batches",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    workspaceId: uuid("workspace_id")
      .notNull()
      .references(() => workspaces.id, { onDelete: "cascade" }),
    code: text("code").notNull(),
    recipeId: uuid("recipe_id")
      .notNull()
      .references(() => recipes.id, { onDelete: "restrict" }),
    versionId: uuid("version_id")
      .notNull()
      .references(() => recipeVersions.id, { onDelete: "restrict" }),
    versionNo: integer("version_no").notNull(),
    recipeName: text("recipe_name").notNull(),
    chocolateType: chocolateTypeEnum("chocolate_type").notNull(),
    barMassGrams: numeric("bar_mass_grams", { precision: 8, scale: 2 }).notNull(),
    plannedFor: date("planned_for", { mode: "string" }).notNull(),
    /** What was typed: an amount in g, kg, t, or a number of bars. */
    requestedAmount: numeric("requested_amount", { precision: 18, scale: 3 }).notNull(),
    requestedUnit: batchMassUnitEnum("requested_unit").notNull(),
    requestedMassGrams: grams("requested_mass_grams").notNull(),
    /** The batch as weighed: the request rounded to whole scale steps. */
    totalMassGrams: grams("total_mass_grams").notNull(),
    resolutionGrams: numeric("resolution_grams", { precision: 10, scale: 3 }).notNull(),
    stationId: uuid("station_id").references(() => weighingStations.id, { onDelete: "set null" }),
    stationName: text("station_name").notNull(),
    stationCapacityKg: kilograms("station_capacity_kg"),
    machineId: uuid("machine_id").references(() => machines.id, { onDelete: "set null" }),
    machineName: text("machine_name"),
    machineCapacityKg: kilograms("machine_capacity_kg"),
    loadCount: integer("load_count").notNull(),
    loads: jsonb("loads").$type<StoredLoad[]>().notNull(),
    scaleNotes: jsonb("scale_notes").$type<string[]>().notNull(),
    roastPresetName: text("roast_preset_name"),
    roastTemperatureC: numeric("roast_temperature_c", { precision: 6, scale: 1 }),
    roastMinutes: numeric("roast_minutes", { precision: 6, scale: 1 }),
    refiningHours: numeric("refining_hours", { precision: 6, scale: 1 }),
    conchingHours: numeric("conching_hours", { precision: 6, scale: 1 }),
    notes: text("notes"),
    status: batchStatusEnum("status").notNull().default("planned"),
    createdById: uuid("created_by_id").references(() => users.id, { onDelete: "set null" }),
    cancelledAt: timestamp("cancelled_at", { withTimezone: true, mode: "date" }),
    createdAt: createdAt(),
    updatedAt: updatedAt(),
  },
  (t) => [
    unique("batches_workspace_code").on(t.workspaceId, t.code),
    index("batches_workspace_created_idx").on(t.workspaceId, t.createdAt),
    index("batches_recipe_idx").on(t.recipeId),
    index("batches_version_idx").on(t.versionId),
  ],
);

export type Batch = typeof batches.$inferSelect;

/** A line of a batch: the version's line with its batch mass (grams, from the engine). */
export const batchLines = pgTable(
  "batch_lines",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    batchId: uuid("batch_id")
      .notNull()
      .references(() => batches.id, { onDelete: "cascade" }),
    position: integer("position").notNull(),
    ingredientId: uuid("ingredient_id")
      .notNull()
      .references(() => ingredients.id, { onDelete: "restrict" }),
    ingredientName: text("ingredient_name").notNull(),
    ingredientKind: ingredientKindEnum("ingredient_kind").notNull(),
    percent: numeric("percent", { precision: 9, scale: 4 }).notNull(),
    massGrams: grams("mass_grams").notNull(),
    allergens: text("allergens").array().notNull(),
  },
  (t) => [unique("batch_lines_position").on(t.batchId, t.position), index("batch_lines_ingredient_idx").on(t.ingredientId)],
);

export type BatchLine = typeof batchLines.$inferSelect;

/**
 * What was actually made of a batch, recorded once when the run is complete.
 * Insert-only, like its lines: completing a run consumes nib stock.
 */
export const productionRuns = pgTable(
  "production_runs",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    workspaceId: uuid("workspace_id")
      .notNull()
      .references(() => workspaces.id, { onDelete: "cascade" }),
    batchId: uuid("batch_id")
      .notNull()
      .references(() => batches.id, { onDelete: "cascade" }),
    startedAt: timestamp("started_at", { withTimezone: true, mode: "date" }).notNull(),
    endedAt: timestamp("ended_at", { withTimezone: true, mode: "date" }).notNull(),
    /** A line deviates when |actual − planned| exceeds this percent of planned (and one scale step). */
    tolerancePercent: numeric("tolerance_percent", { precision: 6, scale: 3 }).notNull(),
    notes: text("notes"),
    recordedById: uuid("recorded_by_id").references(() => users.id, { onDelete: "set null" }),
    createdAt: createdAt(),
  },
  (t) => [unique("production_runs_batch").on(t.batchId), index("production_runs_workspace_idx").on(t.workspaceId)],
);

export type ProductionRun = typeof productionRuns.$inferSelect;

/**
 * One weighed portion of a batch line: its actual mass and the lot it came from.
 * A line may take several portions (e.g. nibs from two bean lots). `lotId` links
 * a bean lot (the recall question); `consumesNibs` says the mass came out of that
 * lot's nib stock.
 */
export const runLines = pgTable(
  "run_lines",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    workspaceId: uuid("workspace_id")
      .notNull()
      .references(() => workspaces.id, { onDelete: "cascade" }),
    runId: uuid("run_id")
      .notNull()
      .references(() => productionRuns.id, { onDelete: "cascade" }),
    batchLineId: uuid("batch_line_id")
      .notNull()
      .references(() => batchLines.id, { onDelete: "cascade" }),
    position: integer("position").notNull(),
    actualGrams: grams("actual_grams").notNull(),
    lotCode: text("lot_code"),
    lotId: uuid("lot_id").references(() => beanLots.id, { onDelete: "restrict" }),
    consumesNibs: boolean("consumes_nibs").notNull().default(false),
  },
  (t) => [
    unique("run_lines_position").on(t.runId, t.position),
    index("run_lines_lot_idx").on(t.lotId),
    index("run_lines_batch_line_idx").on(t.batchLineId),
  ],
);

export type RunLine = typeof runLines.$inferSelect;
