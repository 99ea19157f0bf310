/**
 * loadPricedIngredients (one round trip, used by evaluate and save) must price
 * exactly as getCurrentPrices, the rule costing uses: same preferred supplier's
 * quote, same validity window, same exchange rate.
 */
import { describe, expect, it } from "vitest";
import { ingredients } from "@/db/schema";
import { db } from "@/db/client";
import { loadPricedIngredients } from "@/lib/data/priced-ingredients";
import { getCurrentPrices } from "@/lib/data/prices";
import { costedRecipe } from "../support/costing";
import { createTeam } from "../support/fixtures";
import { eq } from "drizzle-orm";

describe("loadPricedIngredients", () => {
  it("gives each ingredient the price getCurrentPrices gives, on days either side of a quote's end", async () => {
    const team = await createTeam("priced");
    const { ids } = await costedRecipe(team);
    const all = (await db.select({ id: ingredients.id }).from(ingredients).where(eq(ingredients.workspaceId, team.workspaceId))).map((r) => r.id);
    for (const on of ["2026-03-01", "2026-08-01", "2025-12-01"]) {
      const mine = await loadPricedIngredients({ workspaceId: team.workspaceId, ingredientIds: all, on });
      const rule = await getCurrentPrices({ workspaceId: team.workspaceId, ingredientIds: all, on });
      expect(mine.size).toBe(all.length);
      for (const id of all) {
        const p = rule[id]!;
        expect({ on, id, price: mine.get(id)!.pricePerKg }).toEqual({ on, id, price: p.status === "priced" ? p.pricePerKg : null });
      }
    }
    // Hand-checked: sugar at 985 GBP per tonne × 1.149 EUR/GBP = 1.131765 EUR/kg until 2026-06-30 (invented demo figures).
    expect((await loadPricedIngredients({ workspaceId: team.workspaceId, ingredientIds: [ids.sugar], on: "2026-03-01" })).get(ids.sugar)!.pricePerKg).toBe("1.131765");
  });

  it("leaves out ids of another workspace", async () => {
    const team = await createTeam("priced-a");
    const other = await createTeam("priced-b");
    const { ids } = await costedRecipe(other);
    const found = await loadPricedIngredients({ workspaceId: team.workspaceId, ingredientIds: [ids.nibs], on: "2026-03-01" });
    expect(found.size).toBe(0);
  });
});
