/**
 * A costed recipe for integration tests, made through the app's own data
 * functions: the 70 % dark starting point (nibs 64, cocoa butter 7.3, sugar
 * 28.4, lecithin 0.3; 70 g bar) with invented suppliers, quotes and a GBP rate
 * (demo data, not market prices). Safe to call again in the same workspace.
 */
import { db } from "@/db/client";
import { exchangeRates } from "@/db/schema";
import { createSupplier } from "@/lib/data/suppliers";
import { setPreferredSupplier } from "@/lib/data/ingredients";
import { costSettingsSchema } from "@/lib/validation/costing";
import type { TeamFixture } from "./fixtures";
import { makeQuote, tag } from "./ingredients";
import { darkRecipe, referenceIds } from "./recipe-fixtures";

export async function makeLeadSupplier(workspaceId: string, name: string, currency: string, leadTimeDays: number | null) {
  const full = `${name} ${tag()}`;
  const { id } = await createSupplier({ workspaceId, input: { name: full, currency, contactName: null, email: null, leadTimeDays, notes: null } });
  return { id, name: full };
}

export async function costedRecipe(team: TeamFixture) {
  const ws = team.workspaceId;
  const buyer = team.people.buyer.id;
  const ids = await referenceIds(ws);
  const recipeId = await darkRecipe(team);
  const beans = await makeLeadSupplier(ws, "Greyfriars Bean Importers", "EUR", 42);
  const sugarCo = await makeLeadSupplier(ws, "Saltmarsh Sugar Company", "GBP", 10);
  const fine = await makeLeadSupplier(ws, "Tallis Fine Ingredients", "EUR", 7);
  // Invented demo rate: 1 GBP = 1.149 EUR from 2026-01-01.
  await db.insert(exchangeRates).values({ workspaceId: ws, currency: "GBP", rateToBase: "1.149", validOn: "2026-01-01" }).onConflictDoNothing();
  await makeQuote(ws, buyer, { supplierId: beans.id, ingredientId: ids.nibs, price: "16.2", validFrom: "2026-01-01" });
  await makeQuote(ws, buyer, { supplierId: beans.id, ingredientId: ids.butter, price: "19.8", validFrom: "2026-01-01" });
  await makeQuote(ws, buyer, { supplierId: fine.id, ingredientId: ids.lecithin, price: "6.8", validFrom: "2026-01-01" });
  // Sugar: 985 GBP per tonne until the end of June; 1.30 EUR/kg from a second supplier, 500 kg minimum.
  await makeQuote(ws, buyer, { supplierId: sugarCo.id, ingredientId: ids.sugar, price: "985", currency: "GBP", unit: "per_tonne", validFrom: "2026-01-01", validUntil: "2026-06-30" });
  await makeQuote(ws, buyer, { supplierId: fine.id, ingredientId: ids.sugar, price: "1.3", validFrom: "2026-01-01", minimumOrderKg: "500" });
  for (const [ingredientId, supplierId] of [[ids.nibs, beans.id], [ids.butter, beans.id], [ids.lecithin, fine.id], [ids.sugar, sugarCo.id]] as const) {
    await setPreferredSupplier({ workspaceId: ws, ingredientId, supplierId });
  }
  return { ids, recipeId, suppliers: { beans, sugarCo, fine } };
}

/** A settings form as the page posts it (strings), with overrides. */
export function settingsForm(recipeId: string, over: Record<string, string> = {}) {
  return {
    recipeId,
    expectedRevision: "0",
    processLossPercent: "",
    packagingPerBar: "",
    labourPerBar: "",
    labourPerKg: "",
    overheadPerBar: "",
    overheadPerKg: "",
    barsPerCase: "1",
    wholesaleMarginPercent: "",
    retailMarginPercent: "",
    wholesalePricePerBar: "",
    retailPricePerBar: "",
    batchKg: "",
    needWithinDays: "",
    note: "",
    ...over,
  };
}

export const parseSettings = (recipeId: string, over: Record<string, string> = {}) => costSettingsSchema.parse(settingsForm(recipeId, over));
