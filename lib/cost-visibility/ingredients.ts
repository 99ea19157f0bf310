import "server-only";
import { canSeeCosts } from "@/lib/auth/costs";
import type { Viewer } from "@/lib/auth/current";
import { listIngredients, type IngredientRecord } from "@/lib/data/ingredients";
import { getCurrentPrices, type CurrentPrice } from "@/lib/data/prices";
import { isoDay } from "@/lib/pricing/convert";

/** A library row; `currentPrice` is there only for a viewer who may see costs. */
export type IngredientListRow = IngredientRecord & { currentPrice?: CurrentPrice | null };

/**
 * The ingredient library for GET /api/ingredients: with each preferred
 * supplier's current price for those who may see costs, without any price
 * (the prices are not even looked up) for the others.
 */
export async function listIngredientsForViewer({
  viewer,
  archived,
  on = isoDay(new Date()),
}: {
  viewer: Viewer;
  archived: "include" | "exclude" | "only";
  on?: string;
}): Promise<{ ingredients: IngredientListRow[]; pricesShown: boolean }> {
  const workspaceId = viewer.workspace.id;
  const [list, pricesShown] = await Promise.all([listIngredients({ workspaceId, archived }), canSeeCosts(viewer)]);
  if (!pricesShown) return { ingredients: list, pricesShown };
  const prices = await getCurrentPrices({ workspaceId, ingredientIds: list.map((i) => i.id), on });
  return { ingredients: list.map((i) => ({ ...i, currentPrice: prices[i.id] ?? null })), pricesShown };
}

/** One ingredient's current price for its page; not looked up for a viewer who may not see costs. */
export async function getIngredientPriceForViewer({
  viewer,
  ingredientId,
  on,
}: {
  viewer: Viewer;
  ingredientId: string;
  on: string;
}): Promise<{ shown: false } | { shown: true; price: CurrentPrice | null }> {
  if (!(await canSeeCosts(viewer))) return { shown: false };
  const prices = await getCurrentPrices({ workspaceId: viewer.workspace.id, ingredientIds: [ingredientId], on });
  return { shown: true, price: prices[ingredientId] ?? null };
}
