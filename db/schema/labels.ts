import { index, integer, numeric, pgTable, text, uuid } from "drizzle-orm/pg-core";
import { createdAt, updatedAt } from "./columns";
import { recipes } from "./recipes";
import { users } from "./users";
import { workspaces } from "./workspaces";

/**
 * What a recipe's label needs beyond the recipe itself, filled in by the maker:
 * the "may contain" (cross-contact) statement, how the bar breaks into pieces
 * (for the US serving size) and an optional EU portion. One row per recipe, kept
 * across versions; figures come from the version the label shows.
 */
export const recipeLabels = pgTable(
  "recipe_labels",
  {
    recipeId: uuid("recipe_id")
      .primaryKey()
      .references(() => recipes.id, { onDelete: "cascade" }),
    workspaceId: uuid("workspace_id")
      .notNull()
      .references(() => workspaces.id, { onDelete: "cascade" }),
    /** Free text after "May contain", e.g. "milk, hazelnuts". Null = nothing declared. */
    mayContain: text("may_contain"),
    /** Equal pieces the bar breaks into; null = one block (served by fractions). */
    piecesPerBar: integer("pieces_per_bar"),
    /** EU portion for the per-portion column, grams; null = per 100 g only. */
    euPortionGrams: numeric("eu_portion_grams", { precision: 8, scale: 2 }),
    updatedById: uuid("updated_by_id").references(() => users.id, { onDelete: "set null" }),
    createdAt: createdAt(),
    updatedAt: updatedAt(),
  },
  (t) => [index("recipe_labels_workspace_idx").on(t.workspaceId), index("recipe_labels_updated_by_idx").on(t.updatedById)],
);

export type RecipeLabel = typeof recipeLabels.$inferSelect;
export type NewRecipeLabel = typeof recipeLabels.$inferInsert;
