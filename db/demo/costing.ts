/**
 * Demo cost settings of Fenwick Lane Chocolate Works' recipes: process loss,
 * packaging, labour, overhead, case size, target margins and selling prices.
 * Every figure is INVENTED demo data (labelled as such in each revision's
 * note), in the workspace's base currency. Idempotent: a recipe that already
 * has cost settings is left alone.
 */
import { and, eq, inArray } from "drizzle-orm";
import { recipeCostSettings, recipes, workspaces, type NewRecipeCostSettingsRow } from "../schema";
import type { DemoSeeder } from "./context";

type DemoSettings = Omit<NewRecipeCostSettingsRow, "workspaceId" | "recipeId" | "revision" | "currency" | "note" | "createdById">;

const NOTE = "Demo data: invented costs and prices.";

// Shared by the plain bars; a 60 kg refiner batch, ingredients needed within 30 days.
const house: DemoSettings = {
  processLossPercent: "3",
  packagingPerBar: "0.32",
  labourPerBar: "0",
  labourPerKg: "4.2",
  overheadPerBar: "0.04",
  overheadPerKg: "2.1",
  barsPerCase: 12,
  wholesaleMarginPercent: "45",
  retailMarginPercent: "60",
  wholesalePricePerBar: "2.6",
  retailPricePerBar: "4.5",
  batchKg: "60",
  needWithinDays: 30,
};

const DEMO_SETTINGS: Record<string, DemoSettings> = {
  "House dark 70 %": house,
  "Deep dark 82 %": { ...house, wholesalePricePerBar: "2.8", retailPricePerBar: "4.9" },
  "Harbour milk 45 %": { ...house, processLossPercent: "3.5", wholesalePricePerBar: "2.5", retailPricePerBar: "4.3" },
  "Quayside white 34 %": { ...house, processLossPercent: "4", wholesalePricePerBar: "2.6", retailPricePerBar: "4.5" },
  // Folding in whole nuts by hand adds labour per bar; a bigger box.
  "Hazelnut dark, 15 % roasted hazelnuts": { ...house, packagingPerBar: "0.34", labourPerBar: "0.05", batchKg: "25", wholesalePricePerBar: "2.9", retailPricePerBar: "5.2" },
};

export const seedCosting: DemoSeeder = async ({ tx, workspaceId, people }) => {
  const [ws] = await tx.select({ currency: workspaces.baseCurrency }).from(workspaces).where(eq(workspaces.id, workspaceId));
  const found = await tx
    .select({ id: recipes.id, name: recipes.name })
    .from(recipes)
    .where(and(eq(recipes.workspaceId, workspaceId), inArray(recipes.name, Object.keys(DEMO_SETTINGS))));
  for (const recipe of found) {
    const [existing] = await tx.select({ id: recipeCostSettings.id }).from(recipeCostSettings).where(eq(recipeCostSettings.recipeId, recipe.id)).limit(1);
    if (existing) continue;
    await tx.insert(recipeCostSettings).values({
      ...DEMO_SETTINGS[recipe.name]!,
      workspaceId,
      recipeId: recipe.id,
      revision: 1,
      currency: ws?.currency ?? "EUR",
      note: NOTE,
      createdById: people.buyer,
    });
  }
};
