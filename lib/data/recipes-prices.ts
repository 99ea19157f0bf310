import "server-only";
import { db } from "@/db/client";
import type { DemoContext } from "@/db/demo/context";
import { isoDay } from "@/lib/pricing/convert";
import type { Executor } from "./recipes-db";
import { getCurrentPrices } from "./prices";
import { pricesInTransaction } from "./recipes-rows";

/**
 * Price per kg in base currency of each ingredient that has one on day `on`
 * (its preferred supplier's current quote; see getCurrentPrices). Ingredients
 * without a price are simply absent: the engine then says which line lacks one.
 * Inside a transaction the same rule is read through it (recipes-rows.ts).
 */
export async function currentPricesFor({
  workspaceId,
  ingredientIds,
  on,
  executor = db,
}: {
  workspaceId: string;
  ingredientIds: readonly string[];
  on: Date;
  executor?: Executor;
}): Promise<Map<string, string>> {
  if (ingredientIds.length === 0) return new Map();
  if (executor !== db) return pricesInTransaction(executor as DemoContext["tx"], { workspaceId, ingredientIds, on: isoDay(on) });
  const prices = await getCurrentPrices({ workspaceId, ingredientIds, on: isoDay(on) });
  const out = new Map<string, string>();
  for (const p of Object.values(prices)) if (p.status === "priced") out.set(p.ingredientId, p.pricePerKg);
  return out;
}
