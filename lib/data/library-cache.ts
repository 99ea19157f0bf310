import "server-only";
import { isoDay } from "@/lib/pricing/convert";
import type { BenchIngredient } from "@/lib/recipes/types";
import { loadPricedIngredients } from "./priced-ingredients";

/**
 * The workspace's whole library with today's prices, kept in this process for
 * a few seconds: what POST /api/recipes/evaluate reads, so a burst of
 * evaluations (an integration recomputing many recipes) costs one library read
 * instead of one per call. An evaluation may therefore use a profile or price
 * up to LIBRARY_TTL_MS old; saves never use this (they read afresh inside the
 * save, lib/data/recipes-save.ts).
 */
export const LIBRARY_TTL_MS = 5_000;
const MAX_WORKSPACES = 200;

type Entry = { at: number; day: string; library: Promise<Map<string, BenchIngredient>> };
const entries = new Map<string, Entry>();

export function cachedLibrary({ workspaceId, on, now = Date.now() }: { workspaceId: string; on: Date; now?: number }): Promise<Map<string, BenchIngredient>> {
  const day = isoDay(on);
  const hit = entries.get(workspaceId);
  if (hit && hit.day === day && now - hit.at < LIBRARY_TTL_MS) return hit.library;
  const library = loadPricedIngredients({ workspaceId, ingredientIds: "all", on: day });
  // A failed read is not kept: the next call tries again.
  library.catch(() => entries.get(workspaceId)?.library === library && entries.delete(workspaceId));
  entries.delete(workspaceId);
  entries.set(workspaceId, { at: now, day, library });
  // Oldest first in a Map: drop the oldest when full.
  if (entries.size > MAX_WORKSPACES) entries.delete(entries.keys().next().value!);
  return library;
}
