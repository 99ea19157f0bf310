import "server-only";
import { and, asc, eq, inArray } from "drizzle-orm";
import { db } from "@/db/client";
import type { DemoContext } from "@/db/demo/context";
import { ingredients } from "@/db/schema";
import { DEFAULT_INGREDIENTS } from "@/lib/formulation";
import { invalid } from "@/lib/errors";
import { referenceIngredientRow } from "@/lib/ingredients/reference-rows";
import { isoDay } from "@/lib/pricing/convert";
import type { BenchIngredient } from "@/lib/recipes/types";
import type { Executor } from "./recipes-db";
import { loadPricedIngredients } from "./priced-ingredients";
import { currentPricesFor } from "./recipes-prices";
import { ingredientsInTransaction } from "./recipes-rows";

const columns = {
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
};

async function selectIngredients(executor: Executor, workspaceId: string, ids?: string[]) {
  const scope = eq(ingredients.workspaceId, workspaceId);
  return executor
    .select(columns)
    .from(ingredients)
    .where(ids ? and(scope, inArray(ingredients.id, ids)) : scope)
    .orderBy(asc(ingredients.name));
}

type Row = Awaited<ReturnType<typeof selectIngredients>>[number];

function toBench(row: Row, prices: Map<string, string>): BenchIngredient {
  const { archivedAt, ...rest } = row;
  return { ...rest, archived: archivedAt !== null, pricePerKg: prices.get(row.id) ?? null };
}

/**
 * The workspace's ingredients as the bench uses them: composition, allergens
 * and the preferred supplier's current price per kg in base currency (null
 * when there is none). Archived ones are included (old lines use them) and
 * flagged.
 */
export async function listBenchIngredients({
  workspaceId,
  on,
  executor = db,
}: {
  workspaceId: string;
  on: Date;
  executor?: Executor;
}): Promise<BenchIngredient[]> {
  const rows = await selectIngredients(executor, workspaceId);
  const prices = await currentPricesFor({ workspaceId, ingredientIds: rows.map((r) => r.id), on, executor });
  return rows.map((r) => toBench(r, prices));
}

/**
 * The named ingredients of the workspace with today's prices, by id. An id that
 * is not an ingredient of this workspace is the caller's mistake: invalid.
 */
export async function loadBenchIngredients({
  workspaceId,
  ingredientIds,
  on,
  executor = db,
}: {
  workspaceId: string;
  ingredientIds: string[];
  on: Date;
  executor?: Executor;
}): Promise<Map<string, BenchIngredient>> {
  const ids = [...new Set(ingredientIds)];
  // One round trip: this runs on every evaluate and save.
  const found =
    executor === db
      ? await loadPricedIngredients({ workspaceId, ingredientIds: ids, on: isoDay(on) })
      : await ingredientsInTransaction(executor as DemoContext["tx"], { workspaceId, ingredientIds: ids, on: isoDay(on) });
  if (found.size !== ids.length) throw invalid("One of the ingredients is not in this workspace's library any more.", { lines: ["Unknown ingredient."] });
  return found;
}

/**
 * The library ingredient for each engine reference key, added from the
 * reference profile when the workspace has none yet (matched first by its
 * reference key, then by name). For starting points and the demo.
 */
export async function ensureReferenceIngredients({
  workspaceId,
  keys,
  executor = db,
}: {
  workspaceId: string;
  keys: string[];
  executor?: Executor;
}): Promise<Map<string, string>> {
  const out = new Map<string, string>();
  for (const key of new Set(keys)) {
    const profile = DEFAULT_INGREDIENTS.find((p) => p.key === key);
    if (!profile) throw new Error(`unknown reference ingredient ${key}`);
    const row = referenceIngredientRow(profile);
    const found =
      (await executor.select({ id: ingredients.id }).from(ingredients).where(and(eq(ingredients.workspaceId, workspaceId), eq(ingredients.referenceKey, key))).limit(1))[0] ??
      (await executor.select({ id: ingredients.id }).from(ingredients).where(and(eq(ingredients.workspaceId, workspaceId), eq(ingredients.name, row.name))).limit(1))[0];
    if (found) {
      out.set(key, found.id);
      continue;
    }
    const [created] = await executor.insert(ingredients).values({ ...row, workspaceId }).returning({ id: ingredients.id });
    out.set(key, created!.id);
  }
  return out;
}
