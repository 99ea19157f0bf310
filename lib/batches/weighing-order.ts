import type { IngredientKind } from "@/db/schema/ingredients";

/**
 * The order in which lines are weighed and loaded: cocoa first (nibs, liquor,
 * butter, powder), then sugar and milk, flavourings, and last what goes in late —
 * lecithin near the end of conching, inclusions after tempering. Common
 * practice of small makers, no single source.
 */
const RANK: Record<IngredientKind, number> = {
  nibs: 0,
  cocoa_liquor: 1,
  cocoa_butter: 2,
  cocoa_powder: 3,
  sugar: 4,
  milk_powder: 5,
  flavouring: 6,
  other: 7,
  lecithin: 8,
  inclusion: 9,
};

/** Lines sorted for weighing: by kind's rank, then by recipe position. Returns a new array. */
export function inWeighingOrder<T extends { ingredientKind: IngredientKind; position: number }>(lines: readonly T[]): T[] {
  return [...lines].sort((a, b) => RANK[a.ingredientKind] - RANK[b.ingredientKind] || a.position - b.position);
}
