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
  /** Files attached to the ingredient and to the supplier (the nested file routes check the owner too). */
  ingredientFileId: string;
  supplierFileId: string;
};

export async function makeWorkspaceResources(team: TeamFixture): Promise<WorkspaceResources> {
  const setup = await productionSetup(team);
  const batch = await planTestBatch(team, setup);
  const ingredient = await makeIngredient(team.workspaceId);
  const supplier = await makeSupplier(team.workspaceId);
  const lot = await createTestLot(team.workspaceId);
  const order = await insertTestOrder(team.workspaceId);
  const attach = (owner: { ingredientId: string } | { supplierId: string }) =>
    addAttachment({ workspaceId: team.workspaceId, userId: team.people.owner.id, owner, kind: "spec_sheet", fileName: "spec.pdf", bytes: tinyPdf() });
  const ingredientFile = await attach({ ingredientId: ingredient.id });
  const supplierFile = await attach({ supplierId: supplier.id });
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
    ingredientFileId: ingredientFile.id,
    supplierFileId: supplierFile.id,
  };
}

/** The values of a route's params in the given workspace (the file of the route's owner for fileId). */
export function routeParamValues(pattern: string, params: string[], r: WorkspaceResources): Record<string, string> {
  const out: Record<string, string> = {};
  for (const p of params) {
    if (p === "fileId") out[p] = pattern.startsWith("/api/suppliers/") ? r.supplierFileId : r.ingredientFileId;
    else if (r.ids[p]) out[p] = r.ids[p]!;
    else throw new Error(`abuse tests: no resource for route parameter [${p}] of ${pattern}; add one to tests/support/abuse/resources.ts`);
  }
  return out;
}
