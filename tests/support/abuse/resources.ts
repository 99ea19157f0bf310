/**
 * One row of every kind a route parameter can name, made in a workspace through
 * the same fixtures the other integration tests use. `routeParamValues` maps a
 * route's `[param]` to the id of that workspace's row; a parameter not listed
 * here makes the abuse tests fail, so a new route gets a resource as well.
 */
import { addAttachment } from "@/lib/data/attachments";
import { planTestBatch, productionSetup } from "../batches";
import { tinyPdf } from "../files";
import type { TeamFixture } from "../fixtures";
import { makeIngredient, makeSupplier } from "../ingredients";
import { createTestLot } from "../lots";
import { insertTestOrder } from "../purchases";

export type WorkspaceResources = {
  ids: Record<string, string>;
  /** Files attached to the ingredient, the supplier and the lot (the nested file routes check the owner too). */
  fileIds: { ingredients: string; suppliers: string; lots: string };
};

export async function makeWorkspaceResources(team: TeamFixture): Promise<WorkspaceResources> {
  const setup = await productionSetup(team);
  const batch = await planTestBatch(team, setup);
  const ingredient = await makeIngredient(team.workspaceId);
  const supplier = await makeSupplier(team.workspaceId);
  const lot = await createTestLot(team.workspaceId);
  const order = await insertTestOrder(team.workspaceId);
  const attach = (owner: { ingredientId: string } | { supplierId: string } | { lotId: string }) =>
    addAttachment({ workspaceId: team.workspaceId, userId: team.people.owner.id, owner, kind: "spec_sheet", fileName: "spec.pdf", bytes: tinyPdf() });
  const ingredientFile = await attach({ ingredientId: ingredient.id });
  const supplierFile = await attach({ supplierId: supplier.id });
  const lotFile = await attach({ lotId: lot.id });
  return {
    ids: {
      batchId: batch.id,
      recipeId: setup.recipeId,
      versionRef: "1",
      ingredientId: ingredient.id,
      supplierId: supplier.id,
      lotId: lot.id,
      orderId: order.id,
      userId: team.people.viewer.id,
      machineId: setup.machineId,
      stationId: setup.stationId,
    },
    fileIds: { ingredients: ingredientFile.id, suppliers: supplierFile.id, lots: lotFile.id },
  };
}

/** The values of a route's params in the given workspace (for fileId, a file of the row the route names). */
export function routeParamValues(pattern: string, params: string[], r: WorkspaceResources): Record<string, string> {
  const out: Record<string, string> = {};
  const owner = pattern.split("/")[2] as keyof WorkspaceResources["fileIds"];
  for (const p of params) {
    if (p === "fileId") out[p] = r.fileIds[owner] ?? r.fileIds.ingredients;
    else if (r.ids[p]) out[p] = r.ids[p]!;
    else throw new Error(`abuse tests: no resource for route parameter [${p}] of ${pattern}; add one to tests/support/abuse/resources.ts`);
  }
  return out;
}
