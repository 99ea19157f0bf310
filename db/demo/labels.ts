/**
 * Label data of the demo: the nutrient figures a label needs that the library
 * rows lack (filled from the engine's label nutrient profiles by reference key,
 * and for the roasted hazelnut inclusion by name), and the label details of
 * three demo recipes. Runs after the ingredients and recipes seeders. Idempotent:
 * only empty nutrient columns are filled, and label details are added only to
 * recipes that have none.
 */
import { and, eq, isNull, sql, type SQL } from "drizzle-orm";
import { LABEL_NUTRIENT_PROFILES, type LabelNutrients } from "../../lib/formulation";
import { ingredients, recipeLabels, recipes } from "../schema";
import type { DemoContext, DemoSeeder } from "./context";

const COLUMNS = {
  fat: ingredients.fat,
  saturates: ingredients.saturatedFat,
  carbohydrateByDifference: ingredients.carbohydrate,
  sugars: ingredients.sugars,
  fibre: ingredients.fibre,
  protein: ingredients.protein,
  salt: ingredients.salt,
} as const;

const SET_KEYS = { fat: "fat", saturates: "saturatedFat", carbohydrateByDifference: "carbohydrate", sugars: "sugars", fibre: "fibre", protein: "protein", salt: "salt" } as const;

// Dry-roasted hazelnuts per 100 g, from memory of USDA SR Legacy (verify): saturates 4.51 g, sodium 0 mg.
const HAZELNUT_NUTRIENTS: LabelNutrients = { fat: "62.4", saturates: "4.51", carbohydrateByDifference: "17.6", sugars: "4.9", fibre: "9.4", protein: "15", salt: "0" };

// Demo label details (invented): the refiners are shared, so the darks may carry traces of milk and nuts.
const DEMO_LABELS = [
  { name: "House dark 70 %", mayContain: "milk, hazelnuts", piecesPerBar: null, euPortionGrams: null },
  { name: "Harbour milk 45 %", mayContain: "hazelnuts", piecesPerBar: 12, euPortionGrams: "25" },
  { name: "Hazelnut dark, 15 % roasted hazelnuts", mayContain: "milk", piecesPerBar: null, euPortionGrams: null },
];

/** Fills the empty nutrient columns of the rows matching `where` from `nutrients`. */
async function fillEmpty(tx: DemoContext["tx"], where: SQL | undefined, nutrients: LabelNutrients): Promise<void> {
  const set: Record<string, SQL> = {};
  for (const [key, column] of Object.entries(COLUMNS) as [keyof typeof COLUMNS, (typeof COLUMNS)[keyof typeof COLUMNS]][]) {
    const value = nutrients[key];
    if (value !== undefined) set[SET_KEYS[key]] = sql`coalesce(${column}, ${value}::numeric)`;
  }
  if (Object.keys(set).length > 0) await tx.update(ingredients).set(set).where(where);
}

export const seedLabels: DemoSeeder = async ({ tx, workspaceId, people }) => {
  for (const profile of LABEL_NUTRIENT_PROFILES) {
    await fillEmpty(tx, and(eq(ingredients.workspaceId, workspaceId), eq(ingredients.referenceKey, profile.key)), profile.nutrients);
  }
  await fillEmpty(tx, and(eq(ingredients.workspaceId, workspaceId), eq(ingredients.name, "Roasted hazelnuts"), isNull(ingredients.referenceKey)), HAZELNUT_NUTRIENTS);
  for (const demo of DEMO_LABELS) {
    const [recipe] = await tx.select({ id: recipes.id }).from(recipes).where(and(eq(recipes.workspaceId, workspaceId), eq(recipes.name, demo.name)));
    if (!recipe) continue;
    const { name: _name, ...details } = demo;
    await tx.insert(recipeLabels).values({ recipeId: recipe.id, workspaceId, ...details, updatedById: people.formulator }).onConflictDoNothing({ target: recipeLabels.recipeId });
  }
};
