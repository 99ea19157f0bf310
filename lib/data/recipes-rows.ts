/**
 * The rows a version is made of, written through an open transaction. No
 * 'server-only' marker on purpose: the demo seed (db/demo/recipes.ts) runs in
 * plain Node, where that marker throws; nothing here reads the session, and
 * the browser never imports it.
 */
import { and, eq, inArray } from "drizzle-orm";
import type { DemoContext } from "@/db/demo/context";
import { exchangeRates, ingredients, priceQuotes, recipes, recipeVersionLines, recipeVersions, workspaces } from "@/db/schema";
import { evaluateRecipe, type Evaluation } from "@/lib/formulation";
import { currentQuote, quotePerKgInBase } from "@/lib/pricing/convert";
import { toRecipeLines } from "@/lib/recipes/engine-lines";
import { toStored, versionFigures } from "@/lib/recipes/figures";
import { PROFILE_FIELDS, type BenchIngredient } from "@/lib/recipes/types";

type Tx = DemoContext["tx"];

/** A line with its ingredient as read for this save (profile and today's price). */
export type ResolvedLine = { ingredient: BenchIngredient; percent: string };

/** The engine's evaluation and the list figures of a version, computed here and never taken from a client. */
export function computeVersion(lines: readonly ResolvedLine[], barMassGrams: string): { evaluation: Evaluation; figures: ReturnType<typeof versionFigures> } {
  const engineLines = toRecipeLines(lines.map((r) => ({ profile: r.ingredient, percent: r.percent })));
  const evaluation = evaluateRecipe({ lines: engineLines });
  return { evaluation, figures: versionFigures(evaluation, engineLines, barMassGrams) };
}

/**
 * Inserts version `versionNo` with its line snapshots and copies its figures to
 * the recipe row. The caller holds the recipe's row lock and has checked the
 * base (see saveRecipeVersion).
 */
export async function insertVersionRows(
  tx: Tx,
  v: {
    workspaceId: string;
    recipeId: string;
    versionNo: number;
    basedOnVersionNo: number | null;
    restoredFromVersionNo?: number | null;
    note?: string | null;
    authorId: string | null;
    barMassGrams: string;
    lines: readonly ResolvedLine[];
    createdAt?: Date;
  },
): Promise<{ versionId: string }> {
  const { evaluation, figures } = computeVersion(v.lines, v.barMassGrams);
  const [version] = await tx
    .insert(recipeVersions)
    .values({
      workspaceId: v.workspaceId,
      recipeId: v.recipeId,
      versionNo: v.versionNo,
      basedOnVersionNo: v.basedOnVersionNo,
      restoredFromVersionNo: v.restoredFromVersionNo ?? null,
      note: v.note ?? null,
      authorId: v.authorId,
      barMassGrams: v.barMassGrams,
      cocoaPercent: toStored(figures.cocoaPercent)!,
      costPerKg: toStored(figures.costPerKg),
      costPerBar: toStored(figures.costPerBar),
      evaluation,
      ...(v.createdAt ? { createdAt: v.createdAt } : {}),
    })
    .returning({ id: recipeVersions.id });
  await tx.insert(recipeVersionLines).values(
    v.lines.map((r, position) => ({
      versionId: version!.id,
      position,
      ingredientId: r.ingredient.id,
      percent: r.percent,
      ingredientName: r.ingredient.name,
      ...(Object.fromEntries(PROFILE_FIELDS.map((f) => [f, r.ingredient[f]])) as Record<(typeof PROFILE_FIELDS)[number], string>),
      isInclusion: r.ingredient.isInclusion,
      allergens: r.ingredient.allergens,
      pricePerKg: r.ingredient.pricePerKg,
    })),
  );
  await tx
    .update(recipes)
    .set({
      latestVersionNo: v.versionNo,
      barMassGrams: v.barMassGrams,
      cocoaPercent: toStored(figures.cocoaPercent),
      costPerBar: toStored(figures.costPerBar),
      updatedAt: v.createdAt ?? new Date(),
    })
    .where(and(eq(recipes.workspaceId, v.workspaceId), eq(recipes.id, v.recipeId)));
  return { versionId: version!.id };
}

/**
 * Today's price per kg in base currency of each ingredient that has one, read
 * through an open transaction: the rule of getCurrentPrices (lib/data/prices.ts:
 * the preferred supplier's current quote, the latest rate on or before the day)
 * with the same pure functions, for work that must see its own uncommitted rows
 * (the demo seed) or must not take a second connection while holding one.
 */
export async function pricesInTransaction(
  tx: Tx,
  { workspaceId, ingredientIds, on }: { workspaceId: string; ingredientIds: readonly string[]; on: string },
): Promise<Map<string, string>> {
  const out = new Map<string, string>();
  if (ingredientIds.length === 0) return out;
  // One after another: a transaction is one connection.
  const [workspace] = await tx.select({ base: workspaces.baseCurrency }).from(workspaces).where(eq(workspaces.id, workspaceId));
  if (!workspace) return out;
  const rates = await tx
    .select({ currency: exchangeRates.currency, rateToBase: exchangeRates.rateToBase, validOn: exchangeRates.validOn })
    .from(exchangeRates)
    .where(eq(exchangeRates.workspaceId, workspaceId));
  const quotes = await tx
    .select({ quote: priceQuotes })
    .from(priceQuotes)
    .innerJoin(ingredients, and(eq(ingredients.id, priceQuotes.ingredientId), eq(ingredients.preferredSupplierId, priceQuotes.supplierId)))
    .where(and(eq(priceQuotes.workspaceId, workspaceId), inArray(priceQuotes.ingredientId, [...ingredientIds])));
  for (const id of new Set(ingredientIds)) {
    const quote = currentQuote(quotes.filter((q) => q.quote.ingredientId === id).map((q) => q.quote), on);
    if (!quote) continue;
    const converted = quotePerKgInBase(quote, { base: workspace.base, rates, on });
    if (converted.ok) out.set(id, converted.value.perKg);
  }
  return out;
}

/** The named ingredients of the workspace as the bench uses them, through a transaction. */
export async function ingredientsInTransaction(
  tx: Tx,
  { workspaceId, ingredientIds, on }: { workspaceId: string; ingredientIds: readonly string[]; on: string },
): Promise<Map<string, BenchIngredient>> {
  const ids = [...new Set(ingredientIds)];
  if (ids.length === 0) return new Map();
  const rows = await tx
    .select({
      id: ingredients.id,
      name: ingredients.name,
      kind: ingredients.kind,
      cocoaButter: ingredients.cocoaButter,
      cocoaSolidsNonFat: ingredients.cocoaSolidsNonFat,
      milkFat: ingredients.milkFat,
      milkSolidsNonFat: ingredients.milkSolidsNonFat,
      sugar: ingredients.sugar,
      vegetableFat: ingredients.vegetableFat,
      moisture: ingredients.moisture,
      isInclusion: ingredients.isInclusion,
      allergens: ingredients.allergens,
      archivedAt: ingredients.archivedAt,
    })
    .from(ingredients)
    .where(and(eq(ingredients.workspaceId, workspaceId), inArray(ingredients.id, ids)));
  const prices = await pricesInTransaction(tx, { workspaceId, ingredientIds: ids, on });
  return new Map(rows.map(({ archivedAt, ...r }) => [r.id, { ...r, archived: archivedAt !== null, pricePerKg: prices.get(r.id) ?? null }]));
}
