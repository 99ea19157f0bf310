import "server-only";
import { and, eq } from "drizzle-orm";
import { db } from "@/db/client";
import { beanLots, ingredients, priceQuotes, recipeCostPicks, suppliers } from "@/db/schema";
import { lotKey, parseOptionKey, supplierKey } from "@/lib/costing";
import { invalid, notFound } from "@/lib/errors";
import { getRecipe } from "./recipes";

export type PickRecord = { key: string; label: string };

/** The buyer's picks for a recipe, by ingredient id, each with its source's name. */
export async function listPicks({ workspaceId, recipeId }: { workspaceId: string; recipeId: string }): Promise<Map<string, PickRecord>> {
  const rows = await db
    .select({
      ingredientId: recipeCostPicks.ingredientId,
      supplierId: recipeCostPicks.supplierId,
      supplierName: suppliers.name,
      lotId: recipeCostPicks.lotId,
      lotCode: beanLots.code,
      lotOrigin: beanLots.originCountry,
    })
    .from(recipeCostPicks)
    .leftJoin(suppliers, eq(suppliers.id, recipeCostPicks.supplierId))
    .leftJoin(beanLots, eq(beanLots.id, recipeCostPicks.lotId))
    .where(and(eq(recipeCostPicks.workspaceId, workspaceId), eq(recipeCostPicks.recipeId, recipeId)));
  const picks = new Map<string, PickRecord>();
  for (const r of rows) {
    if (r.supplierId) picks.set(r.ingredientId, { key: supplierKey(r.supplierId), label: r.supplierName ?? "a supplier" });
    else if (r.lotId) picks.set(r.ingredientId, { key: lotKey(r.lotId), label: `Lot ${r.lotCode} (${r.lotOrigin})` });
  }
  return picks;
}

/** Checks the source can sell this ingredient: a supplier that has quoted it, or a lot for a nibs ingredient. */
async function checkSource(workspaceId: string, ingredient: { id: string; name: string; kind: string }, source: { kind: "supplier" | "lot"; id: string }) {
  if (source.kind === "supplier") {
    const [supplier] = await db.select({ id: suppliers.id }).from(suppliers).where(and(eq(suppliers.workspaceId, workspaceId), eq(suppliers.id, source.id)));
    if (!supplier) throw notFound("That supplier");
    const [quote] = await db
      .select({ id: priceQuotes.id })
      .from(priceQuotes)
      .where(and(eq(priceQuotes.workspaceId, workspaceId), eq(priceQuotes.supplierId, source.id), eq(priceQuotes.ingredientId, ingredient.id)))
      .limit(1);
    if (!quote) throw invalid(`That supplier has never quoted ${ingredient.name}. Enter a quote first.`, { source: ["No quote from that supplier."] });
    return;
  }
  const [lot] = await db.select({ id: beanLots.id }).from(beanLots).where(and(eq(beanLots.workspaceId, workspaceId), eq(beanLots.id, source.id)));
  if (!lot) throw notFound("That lot");
  if (ingredient.kind !== "nibs") throw invalid(`A bean lot can only price a nibs ingredient, not ${ingredient.name}.`, { source: ["Choose a supplier."] });
}

/**
 * Sets the source of one ingredient in the recipe's chosen combination, or
 * forgets it ("preferred": the preferred supplier again). The recipe,
 * ingredient, supplier and lot must all be the workspace's own.
 */
export async function savePick({
  workspaceId,
  userId,
  recipeId,
  ingredientId,
  source,
}: {
  workspaceId: string;
  userId: string;
  recipeId: string;
  ingredientId: string;
  source: string;
}): Promise<void> {
  await getRecipe({ workspaceId, recipeId });
  const [ingredient] = await db
    .select({ id: ingredients.id, name: ingredients.name, kind: ingredients.kind })
    .from(ingredients)
    .where(and(eq(ingredients.workspaceId, workspaceId), eq(ingredients.id, ingredientId)));
  if (!ingredient) throw notFound("That ingredient");
  const scope = and(eq(recipeCostPicks.workspaceId, workspaceId), eq(recipeCostPicks.recipeId, recipeId), eq(recipeCostPicks.ingredientId, ingredientId));
  if (source === "preferred") {
    await db.delete(recipeCostPicks).where(scope);
    return;
  }
  const parsed = parseOptionKey(source);
  if (!parsed) throw invalid("Choose a supplier or a lot from the list.", { source: ["Unknown source."] });
  await checkSource(workspaceId, ingredient, parsed);
  const sourceIds = { supplierId: parsed.kind === "supplier" ? parsed.id : null, lotId: parsed.kind === "lot" ? parsed.id : null };
  await db
    .insert(recipeCostPicks)
    .values({ workspaceId, recipeId, ingredientId, ...sourceIds, updatedById: userId })
    .onConflictDoUpdate({ target: [recipeCostPicks.recipeId, recipeCostPicks.ingredientId], set: { ...sourceIds, updatedById: userId, updatedAt: new Date() } });
}

/** Forgets every pick of the recipe: the chosen combination is the preferred suppliers again. */
export async function resetPicks({ workspaceId, recipeId }: { workspaceId: string; recipeId: string }): Promise<void> {
  await getRecipe({ workspaceId, recipeId });
  await db.delete(recipeCostPicks).where(and(eq(recipeCostPicks.workspaceId, workspaceId), eq(recipeCostPicks.recipeId, recipeId)));
}
