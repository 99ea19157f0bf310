import { sql } from "drizzle-orm";
import { boolean, index, integer, jsonb, numeric, pgEnum, pgTable, text, timestamp, unique, uuid } from "drizzle-orm/pg-core";
import { createdAt, gramsPer100, money, updatedAt } from "./columns";
import { ingredients } from "./ingredients";
import { users } from "./users";
import { workspaces } from "./workspaces";

export const chocolateTypes = ["dark", "milk", "white", "other"] as const;
export type ChocolateType = (typeof chocolateTypes)[number];
export const chocolateTypeEnum = pgEnum("chocolate_type", chocolateTypes);

/** How a recipe came to be: typed in, from one of our starting points, or copied from a version. */
export const recipeOrigins = ["scratch", "starting_point", "copy"] as const;
export type RecipeOrigin = (typeof recipeOrigins)[number];
export const recipeOriginEnum = pgEnum("recipe_origin", recipeOrigins);

/** A percentage of a recipe or a figure, four decimals. */
const percent = (name: string) => numeric(name, { precision: 9, scale: 4 });

/**
 * A recipe: its identity and details, plus figures copied from its latest
 * version and its current release so the list can filter and sort 10,000
 * recipes on indexed columns without reading versions. Those copies are
 * written in the same transaction as the version or release they come from.
 */
export const recipes = pgTable(
  "recipes",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    workspaceId: uuid("workspace_id")
      .notNull()
      .references(() => workspaces.id, { onDelete: "cascade" }),
    name: text("name").notNull(),
    chocolateType: chocolateTypeEnum("chocolate_type").notNull(),
    /** What the maker aims for, e.g. 70 (% cocoa). */
    targetCocoaPercent: percent("target_cocoa_percent"),
    notes: text("notes"),
    origin: recipeOriginEnum("origin").notNull().default("scratch"),
    startingPointKey: text("starting_point_key"),
    copiedFromRecipeId: uuid("copied_from_recipe_id"),
    copiedFromVersionNo: integer("copied_from_version_no"),
    createdById: uuid("created_by_id").references(() => users.id, { onDelete: "set null" }),
    // Copies of the latest version (0 = no version saved yet).
    latestVersionNo: integer("latest_version_no").notNull().default(0),
    barMassGrams: numeric("bar_mass_grams", { precision: 8, scale: 2 }).notNull(),
    /** Latest version's total dry cocoa solids on the EU basis (what the label's cocoa % comes from). */
    cocoaPercent: percent("cocoa_percent"),
    /** Latest version's ingredient cost per bar at save, in the workspace's base currency. */
    costPerBar: money("cost_per_bar"),
    // Copies of the current release (the most recent release record).
    releasedVersionNo: integer("released_version_no"),
    releasedAt: timestamp("released_at", { withTimezone: true, mode: "date" }),
    createdAt: createdAt(),
    updatedAt: updatedAt(),
  },
  (t) => [
    unique("recipes_workspace_name").on(t.workspaceId, t.name),
    index("recipes_workspace_name_idx").on(t.workspaceId, sql`lower(${t.name})`, t.id),
    index("recipes_workspace_updated_idx").on(t.workspaceId, t.updatedAt, t.id),
    index("recipes_workspace_cocoa_idx").on(t.workspaceId, t.cocoaPercent, t.id),
    index("recipes_workspace_cost_idx").on(t.workspaceId, t.costPerBar, t.id),
    index("recipes_created_by_idx").on(t.createdById),
  ],
);

export type Recipe = typeof recipes.$inferSelect;
export type NewRecipe = typeof recipes.$inferInsert;

/**
 * One saved state of a recipe. Insert-only (a trigger refuses updates): a
 * change is a new version. `evaluation` is the engine's output computed by the
 * server at save, kept as it was.
 */
export const recipeVersions = pgTable(
  "recipe_versions",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    workspaceId: uuid("workspace_id")
      .notNull()
      .references(() => workspaces.id, { onDelete: "cascade" }),
    recipeId: uuid("recipe_id")
      .notNull()
      .references(() => recipes.id, { onDelete: "cascade" }),
    versionNo: integer("version_no").notNull(),
    /** The version the editor started from (null for v1). */
    basedOnVersionNo: integer("based_on_version_no"),
    /** Set when this version restores an older one. */
    restoredFromVersionNo: integer("restored_from_version_no"),
    note: text("note"),
    authorId: uuid("author_id").references(() => users.id, { onDelete: "set null" }),
    barMassGrams: numeric("bar_mass_grams", { precision: 8, scale: 2 }).notNull(),
    cocoaPercent: percent("cocoa_percent").notNull(),
    costPerKg: money("cost_per_kg"),
    costPerBar: money("cost_per_bar"),
    evaluation: jsonb("evaluation").notNull(),
    createdAt: createdAt(),
  },
  (t) => [
    unique("recipe_versions_recipe_version").on(t.recipeId, t.versionNo),
    index("recipe_versions_workspace_idx").on(t.workspaceId),
    index("recipe_versions_author_idx").on(t.authorId),
  ],
);

export type RecipeVersion = typeof recipeVersions.$inferSelect;
export type NewRecipeVersion = typeof recipeVersions.$inferInsert;

/**
 * A line of a version, with the ingredient's profile and price as they were at
 * save (so a version reads the same after the library or prices change).
 */
export const recipeVersionLines = pgTable(
  "recipe_version_lines",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    versionId: uuid("version_id")
      .notNull()
      .references(() => recipeVersions.id, { onDelete: "cascade" }),
    position: integer("position").notNull(),
    ingredientId: uuid("ingredient_id")
      .notNull()
      .references(() => ingredients.id, { onDelete: "restrict" }),
    percent: percent("percent").notNull(),
    ingredientName: text("ingredient_name").notNull(),
    cocoaButter: gramsPer100("cocoa_butter").notNull(),
    cocoaSolidsNonFat: gramsPer100("cocoa_solids_non_fat").notNull(),
    milkFat: gramsPer100("milk_fat").notNull(),
    milkSolidsNonFat: gramsPer100("milk_solids_non_fat").notNull(),
    sugar: gramsPer100("sugar").notNull(),
    vegetableFat: gramsPer100("vegetable_fat").notNull(),
    moisture: gramsPer100("moisture").notNull(),
    isInclusion: boolean("is_inclusion").notNull(),
    allergens: text("allergens").array().notNull(),
    /** Preferred supplier's price per kg in base currency at save; null when there was none. */
    pricePerKg: money("price_per_kg"),
  },
  (t) => [
    unique("recipe_version_lines_position").on(t.versionId, t.position),
    index("recipe_version_lines_ingredient_idx").on(t.ingredientId),
  ],
);

export type RecipeVersionLine = typeof recipeVersionLines.$inferSelect;
export type NewRecipeVersionLine = typeof recipeVersionLines.$inferInsert;

/**
 * Releases for production, append-only: releasing another version (or an older
 * one again) adds a record. The current release is the most recent record.
 */
export const recipeReleases = pgTable(
  "recipe_releases",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    workspaceId: uuid("workspace_id")
      .notNull()
      .references(() => workspaces.id, { onDelete: "cascade" }),
    recipeId: uuid("recipe_id")
      .notNull()
      .references(() => recipes.id, { onDelete: "cascade" }),
    versionId: uuid("version_id")
      .notNull()
      .references(() => recipeVersions.id, { onDelete: "cascade" }),
    versionNo: integer("version_no").notNull(),
    note: text("note"),
    releasedById: uuid("released_by_id").references(() => users.id, { onDelete: "set null" }),
    createdAt: createdAt(),
  },
  (t) => [
    index("recipe_releases_recipe_idx").on(t.recipeId, t.createdAt),
    index("recipe_releases_version_idx").on(t.versionId),
    index("recipe_releases_workspace_idx").on(t.workspaceId),
  ],
);

export type RecipeRelease = typeof recipeReleases.$inferSelect;
export type NewRecipeRelease = typeof recipeReleases.$inferInsert;
