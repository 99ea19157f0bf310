import "server-only";
import { and, asc, count, eq, getTableColumns, isNotNull, isNull } from "drizzle-orm";
import { db } from "@/db/client";
import type { DemoContext } from "@/db/demo/context";
import { attachments, ingredients, priceQuotes, suppliers, type IngredientKind } from "@/db/schema";
import { conflict, invalid, notFound } from "@/lib/errors";
import { referenceIngredientRows } from "@/lib/ingredients/reference-rows";
import type { IngredientInput } from "@/lib/validation/ingredients";
import { findRecipesUsingIngredient } from "./ingredient-usage";
import { plain } from "./numeric";
import { isUniqueViolation } from "./pg-errors";
import { listing, plural } from "./suppliers";

export type IngredientRecord = {
  id: string;
  name: string;
  kind: IngredientKind;
  cocoaButter: string;
  cocoaSolidsNonFat: string;
  milkFat: string;
  milkSolidsNonFat: string;
  sugar: string;
  vegetableFat: string;
  moisture: string;
  isInclusion: boolean;
  fat: string | null;
  saturatedFat: string | null;
  carbohydrate: string | null;
  sugars: string | null;
  fibre: string | null;
  protein: string | null;
  salt: string | null;
  ash: string | null;
  allergens: string[];
  source: string | null;
  referenceKey: string | null;
  preferredSupplierId: string | null;
  preferredSupplierName: string | null;
  notes: string | null;
  archived: boolean;
};

const { workspaceId: _w, createdAt: _c, updatedAt: _u, archivedAt: _a, ...ingredientColumns } = getTableColumns(ingredients);

const selection = { ...ingredientColumns, archivedAt: ingredients.archivedAt, preferredSupplierName: suppliers.name };

type Row = { archivedAt: Date | null } & Omit<IngredientRecord, "archived">;
const FIGURES = [
  "cocoaButter", "cocoaSolidsNonFat", "milkFat", "milkSolidsNonFat", "sugar", "vegetableFat", "moisture",
  "fat", "saturatedFat", "carbohydrate", "sugars", "fibre", "protein", "salt", "ash",
] as const;

const toRecord = ({ archivedAt, ...r }: Row): IngredientRecord => {
  const out = { ...r, archived: archivedAt !== null };
  for (const k of FIGURES) (out as unknown as Record<string, string | null>)[k] = plain(r[k]);
  return out;
};

/** The workspace's ingredient library by name (archived ones only when asked). */
export async function listIngredients({
  workspaceId,
  archived = "exclude",
}: {
  workspaceId: string;
  archived?: "include" | "exclude" | "only";
}): Promise<IngredientRecord[]> {
  const filter =
    archived === "exclude" ? isNull(ingredients.archivedAt) : archived === "only" ? isNotNull(ingredients.archivedAt) : undefined;
  const rows = await db
    .select(selection)
    .from(ingredients)
    .leftJoin(suppliers, eq(suppliers.id, ingredients.preferredSupplierId))
    .where(and(eq(ingredients.workspaceId, workspaceId), filter))
    .orderBy(asc(ingredients.name));
  return rows.map(toRecord);
}

/** One ingredient of the workspace, or a not-found error. */
export async function getIngredientById({
  workspaceId,
  ingredientId,
}: {
  workspaceId: string;
  ingredientId: string;
}): Promise<IngredientRecord> {
  const [row] = await db
    .select(selection)
    .from(ingredients)
    .leftJoin(suppliers, eq(suppliers.id, ingredients.preferredSupplierId))
    .where(and(eq(ingredients.workspaceId, workspaceId), eq(ingredients.id, ingredientId)));
  if (!row) throw notFound("That ingredient");
  return toRecord(row);
}

function nameTaken(err: unknown, name: string): never {
  if (isUniqueViolation(err, "ingredients_workspace_name")) throw conflict(`An ingredient named “${name}” already exists.`);
  throw err;
}

export async function createIngredient({ workspaceId, input }: { workspaceId: string; input: IngredientInput }): Promise<{ id: string }> {
  try {
    const [row] = await db.insert(ingredients).values({ workspaceId, ...input }).returning({ id: ingredients.id });
    return { id: row!.id };
  } catch (err) {
    nameTaken(err, input.name);
  }
}

export async function updateIngredient({
  workspaceId,
  ingredientId,
  input,
}: {
  workspaceId: string;
  ingredientId: string;
  input: IngredientInput;
}): Promise<void> {
  try {
    const done = await db
      .update(ingredients)
      .set(input)
      .where(and(eq(ingredients.workspaceId, workspaceId), eq(ingredients.id, ingredientId)))
      .returning({ id: ingredients.id });
    if (done.length === 0) throw notFound("That ingredient");
  } catch (err) {
    nameTaken(err, input.name);
  }
}

/** Archives (or restores) an ingredient: hidden from new recipes, its history kept. */
export async function setIngredientArchived({
  workspaceId,
  ingredientId,
  archived,
}: {
  workspaceId: string;
  ingredientId: string;
  archived: boolean;
}): Promise<void> {
  const done = await db
    .update(ingredients)
    .set({ archivedAt: archived ? new Date() : null })
    .where(and(eq(ingredients.workspaceId, workspaceId), eq(ingredients.id, ingredientId)))
    .returning({ id: ingredients.id });
  if (done.length === 0) throw notFound("That ingredient");
}

/** Chooses (or clears, with null) the supplier whose current price costs this ingredient. */
export async function setPreferredSupplier({
  workspaceId,
  ingredientId,
  supplierId,
}: {
  workspaceId: string;
  ingredientId: string;
  supplierId: string | null;
}): Promise<void> {
  if (supplierId) {
    const [supplier] = await db
      .select({ archivedAt: suppliers.archivedAt })
      .from(suppliers)
      .where(and(eq(suppliers.workspaceId, workspaceId), eq(suppliers.id, supplierId)));
    if (!supplier) throw notFound("That supplier");
    if (supplier.archivedAt) throw invalid("That supplier is archived; restore it first.", { supplierId: ["That supplier is archived."] });
  }
  const done = await db
    .update(ingredients)
    .set({ preferredSupplierId: supplierId })
    .where(and(eq(ingredients.workspaceId, workspaceId), eq(ingredients.id, ingredientId)))
    .returning({ id: ingredients.id });
  if (done.length === 0) throw notFound("That ingredient");
}

/**
 * Deletes an ingredient nothing refers to. A recipe that uses it, its price
 * quotes (history) or its files make the delete refused, naming them; the
 * ingredient can be archived instead.
 */
export async function deleteIngredient({ workspaceId, ingredientId }: { workspaceId: string; ingredientId: string }): Promise<void> {
  await db.transaction(async (tx) => {
    const [ingredient] = await tx
      .select({ name: ingredients.name })
      .from(ingredients)
      .where(and(eq(ingredients.workspaceId, workspaceId), eq(ingredients.id, ingredientId)))
      .for("update");
    if (!ingredient) throw notFound("That ingredient");
    const recipes = await findRecipesUsingIngredient({ tx, workspaceId, ingredientId });
    if (recipes.length > 0) {
      throw conflict(
        `${ingredient.name} is used by ${recipes.length === 1 ? "the recipe" : "the recipes"} ${listing(recipes)} and cannot be deleted. Archive it instead.`,
      );
    }
    const [quotes] = await tx.select({ n: count() }).from(priceQuotes).where(eq(priceQuotes.ingredientId, ingredientId));
    const [files] = await tx.select({ n: count() }).from(attachments).where(eq(attachments.ingredientId, ingredientId));
    const uses = [plural(quotes?.n ?? 0, "price quote"), plural(files?.n ?? 0, "file")].filter((u): u is string => u !== null);
    if (uses.length > 0) {
      throw conflict(`${ingredient.name} cannot be deleted: ${listing(uses)} still refer to it. Archive it instead; its history stays.`);
    }
    await tx.delete(ingredients).where(and(eq(ingredients.workspaceId, workspaceId), eq(ingredients.id, ingredientId)));
  });
}

/**
 * Gives a new workspace the reference profiles of lib/formulation (with their
 * sources). Runs inside the caller's transaction (sign-up, the demo seed);
 * profiles already present by name are left alone.
 */
export async function addReferenceIngredients({ tx, workspaceId }: { tx: DemoContext["tx"]; workspaceId: string }): Promise<void> {
  await tx
    .insert(ingredients)
    .values(referenceIngredientRows().map((row) => ({ ...row, workspaceId })))
    .onConflictDoNothing({ target: [ingredients.workspaceId, ingredients.name] });
}
