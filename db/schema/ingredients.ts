import { boolean, index, pgEnum, pgTable, text, unique, uuid } from "drizzle-orm/pg-core";
import { archivedAt, createdAt, gramsPer100, updatedAt } from "./columns";
import { suppliers } from "./suppliers";
import { workspaces } from "./workspaces";

export const ingredientKinds = [
  "nibs",
  "cocoa_liquor",
  "cocoa_butter",
  "cocoa_powder",
  "sugar",
  "milk_powder",
  "lecithin",
  "flavouring",
  "inclusion",
  "other",
] as const;
export type IngredientKind = (typeof ingredientKinds)[number];
export const ingredientKindEnum = pgEnum("ingredient_kind", ingredientKinds);

/**
 * An ingredient of the workspace's library: its composition (the engine's
 * IngredientSpec fields, g per 100 g), nutrients per 100 g for labels, and
 * allergens (EU Regulation 1169/2011 Annex II codes). Archived, never deleted,
 * once a recipe uses it.
 */
export const ingredients = pgTable(
  "ingredients",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    workspaceId: uuid("workspace_id")
      .notNull()
      .references(() => workspaces.id, { onDelete: "cascade" }),
    name: text("name").notNull(),
    kind: ingredientKindEnum("kind").notNull(),
    // Composition, g per 100 g (missing = 0; the rest is "other").
    cocoaButter: gramsPer100("cocoa_butter").notNull().default("0"),
    cocoaSolidsNonFat: gramsPer100("cocoa_solids_non_fat").notNull().default("0"),
    milkFat: gramsPer100("milk_fat").notNull().default("0"),
    milkSolidsNonFat: gramsPer100("milk_solids_non_fat").notNull().default("0"),
    sugar: gramsPer100("sugar").notNull().default("0"),
    vegetableFat: gramsPer100("vegetable_fat").notNull().default("0"),
    moisture: gramsPer100("moisture").notNull().default("0"),
    /** An added foodstuff (nuts, fruit, nibs on top) that the standards deduct. */
    isInclusion: boolean("is_inclusion").notNull().default(false),
    // Nutrients per 100 g, for labels (null = not known yet).
    fat: gramsPer100("fat"),
    saturatedFat: gramsPer100("saturated_fat"),
    carbohydrate: gramsPer100("carbohydrate"),
    sugars: gramsPer100("sugars"),
    fibre: gramsPer100("fibre"),
    protein: gramsPer100("protein"),
    salt: gramsPer100("salt"),
    ash: gramsPer100("ash"),
    /** EU 1169/2011 Annex II allergen codes, e.g. {milk,soybeans}. */
    allergens: text("allergens").array().notNull().default([]),
    /** Where the figures come from (a USDA FDC entry, a supplier's spec sheet…). */
    source: text("source"),
    /** The lib/formulation reference profile this was created from, if any. */
    referenceKey: text("reference_key"),
    preferredSupplierId: uuid("preferred_supplier_id").references(() => suppliers.id, { onDelete: "set null" }),
    notes: text("notes"),
    archivedAt: archivedAt(),
    createdAt: createdAt(),
    updatedAt: updatedAt(),
  },
  (t) => [
    unique("ingredients_workspace_name").on(t.workspaceId, t.name),
    index("ingredients_workspace_idx").on(t.workspaceId),
    index("ingredients_preferred_supplier_idx").on(t.preferredSupplierId),
  ],
);

export type Ingredient = typeof ingredients.$inferSelect;
export type NewIngredient = typeof ingredients.$inferInsert;
