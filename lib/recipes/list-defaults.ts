import type { RecipeSort } from "@/lib/validation/recipes";

/** Which way each sort runs first: names A→Z, newest first, most cocoa first, cheapest first. */
export const DEFAULT_DIRECTION: Record<RecipeSort, "asc" | "desc"> = { name: "asc", updated: "desc", cocoa: "desc", cost: "asc" };
