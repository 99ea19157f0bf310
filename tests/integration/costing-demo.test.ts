import { and, eq } from "drizzle-orm";
import { describe, expect, it } from "vitest";
import { db } from "@/db/client";
import { recipeCostSettings, recipes } from "@/db/schema";
import { seedDemo } from "@/db/seed";
import { loadRecipeCosting } from "@/lib/data/costing";

describe("the demo cost settings", () => {
  it("give each demo recipe one labelled revision, once, and cost the house dark as the browser test expects", async () => {
    const { workspaceId } = await seedDemo(db);
    await seedDemo(db);
    const rows = await db
      .select({ name: recipes.name, revision: recipeCostSettings.revision, currency: recipeCostSettings.currency, note: recipeCostSettings.note })
      .from(recipeCostSettings)
      .innerJoin(recipes, eq(recipes.id, recipeCostSettings.recipeId))
      .where(eq(recipeCostSettings.workspaceId, workspaceId));
    expect(rows).toHaveLength(5);
    expect(rows.every((r) => r.revision === 1 && r.currency === "EUR" && r.note === "Demo data: invented costs and prices.")).toBe(true);
    const [house] = await db.select({ id: recipes.id }).from(recipes).where(and(eq(recipes.workspaceId, workspaceId), eq(recipes.name, "House dark 70 %")));
    const costing = await loadRecipeCosting({ workspaceId, recipeId: house!.id, on: "2026-12-01" });
    // Worked in tests/e2e/costing.test.ts: 1.71314395531 → EUR 1.713 per bar, EUR 20.56 per case of 12.
    const cost = costing.report.scenarios.chosen.cost;
    expect(cost.ok && cost.costPerBar).toMatch(/^1\.71314395530927835/);
    expect(cost.ok && cost.ingredientCostPerKg).toBe("12.639709095");
  });
});
