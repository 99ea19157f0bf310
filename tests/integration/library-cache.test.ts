/**
 * The evaluate API's library cache (lib/data/library-cache.ts): the same
 * figures as a fresh read, kept for LIBRARY_TTL_MS at most, then read again.
 */
import { describe, expect, it } from "vitest";
import { cachedLibrary, LIBRARY_TTL_MS } from "@/lib/data/library-cache";
import { loadPricedIngredients } from "@/lib/data/priced-ingredients";
import { evaluateRequest } from "@/lib/data/recipes-evaluate";
import { costedRecipe } from "../support/costing";
import { createTeam } from "../support/fixtures";
import { makeQuote } from "../support/ingredients";

const on = new Date("2026-03-01T12:00:00Z");

describe("cachedLibrary", () => {
  it("holds what a fresh read gives, sees a new quote only after its time is up", async () => {
    const team = await createTeam("lib-cache");
    const { ids, suppliers } = await costedRecipe(team);
    const t0 = 1_000_000;
    const first = await cachedLibrary({ workspaceId: team.workspaceId, on, now: t0 });
    expect(first).toEqual(await loadPricedIngredients({ workspaceId: team.workspaceId, ingredientIds: "all", on: "2026-03-01" }));
    expect(first.get(ids.nibs)!.pricePerKg).toBe("16.2");
    // A newer quote from the preferred supplier (invented figure).
    await makeQuote(team.workspaceId, team.people.buyer.id, { supplierId: suppliers.beans.id, ingredientId: ids.nibs, price: "17.5", validFrom: "2026-02-01" });
    expect((await cachedLibrary({ workspaceId: team.workspaceId, on, now: t0 + LIBRARY_TTL_MS - 1 })).get(ids.nibs)!.pricePerKg).toBe("16.2");
    expect((await cachedLibrary({ workspaceId: team.workspaceId, on, now: t0 + LIBRARY_TTL_MS })).get(ids.nibs)!.pricePerKg).toBe("17.5");
  });

  it("leaves the evaluate API answering 'not in the library' for another workspace's ingredient", async () => {
    const team = await createTeam("lib-cache-a");
    const other = await createTeam("lib-cache-b");
    const { ids } = await costedRecipe(other);
    await expect(evaluateRequest({ workspaceId: team.workspaceId, request: { lines: [{ ingredientId: ids.nibs, percent: "100" }] } })).rejects.toThrow(/not in this workspace's library/);
  });
});
