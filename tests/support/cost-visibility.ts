/**
 * A workspace with something priced on every surface that shows money: the
 * costed 70 % dark (tests/support/costing.ts), a second dark saved while every
 * line has a current quote and released (so production lists it with a cost
 * per bar), a bean lot with a freight line and a costed roast, a planned batch
 * (material requirements with quotes) and a drafted purchase order. Invented
 * figures, demo data.
 */
import { db } from "@/db/client";
import { lotCosts, processingRecords } from "@/db/schema";
import type { Viewer } from "@/lib/auth/current";
import { setPreferredSupplier } from "@/lib/data/ingredients";
import { releaseVersion } from "@/lib/data/recipes-releases";
import { productionSetup, planTestBatch } from "./batches";
import { costedRecipe } from "./costing";
import type { TeamFixture } from "./fixtures";
import { createTestLot, newKey } from "./lots";
import { insertTestOrder } from "./purchases";
import { darkRecipe } from "./recipe-fixtures";

export async function pricedWorkspace(team: TeamFixture) {
  const ws = team.workspaceId;
  const costed = await costedRecipe(team);
  // Sugar from the supplier whose quote has no end, so today's save prices every line.
  await setPreferredSupplier({ workspaceId: ws, ingredientId: costed.ids.sugar, supplierId: costed.suppliers.fine.id });
  const pricedRecipeId = await darkRecipe(team);
  await releaseVersion({ workspaceId: ws, userId: team.people.formulator.id, recipeId: pricedRecipeId, versionNo: 1 });
  const lot = await createTestLot(ws, { pricePaid: "500", currency: "EUR" });
  await db.insert(lotCosts).values({ workspaceId: ws, lotId: lot.id, label: "Freight", amount: "40", currency: "EUR" });
  await db.insert(processingRecords).values({ workspaceId: ws, lotId: lot.id, step: "roasting", performedOn: "2026-10-02", massInKg: "100", massOutKg: "95", roastTemperatureC: "130", roastMinutes: "20", cost: "12", submissionKey: newKey() });
  const setup = await productionSetup(team);
  const batch = await planTestBatch(team, setup);
  const order = await insertTestOrder(ws);
  return { ...costed, pricedRecipeId, lotId: lot.id, batchId: batch.id, orderId: order.id };
}

/** The viewer object the pages get from requireViewer(), for calling loaders directly. */
export function viewerOf(team: TeamFixture, role: Viewer["role"]): Viewer {
  const p = team.people[role];
  return { user: { id: p.id, email: p.email, name: p.name }, workspace: { id: team.workspaceId, name: "test works" }, role };
}
