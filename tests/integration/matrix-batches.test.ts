/**
 * Role × action matrix for batches, runs, machines and purchase orders: every
 * server action and route handler of the feature, as each role, a signed-out
 * visitor and another workspace's owner.
 */
import { eq } from "drizzle-orm";
import { GET as getBatchPdf } from "@/app/api/batches/[batchId]/pdf/route";
import { GET as getBatch } from "@/app/api/batches/[batchId]/route";
import { GET as getPreview } from "@/app/api/batches/preview/route";
import { GET as getBatches } from "@/app/api/batches/route";
import { GET as getOrderCsv } from "@/app/api/purchase-orders/[orderId]/csv/route";
import { cancelBatchAction, planBatchAction, recordRunAction } from "@/app/(app)/batches/actions";
import {
  cancelPurchaseOrderAction,
  draftPurchaseOrderAction,
  receivePurchaseOrderAction,
  sendPurchaseOrderAction,
  updatePurchaseOrderAction,
} from "@/app/(app)/batches/purchase-orders/actions";
import { archiveMachineAction, archiveStationAction, createMachineAction, createStationAction } from "@/app/(app)/settings/machines/actions";
import { db } from "@/db/client";
import { ingredients } from "@/db/schema";
import { getBatch as readBatch } from "@/lib/data/batches";
import { createMachine, createStation } from "@/lib/data/machines";
import { cancelPurchaseOrder } from "@/lib/data/purchase-order-status";
import { lotWithNibs, planTestBatch, productionSetup } from "../support/batches";
import { makeQuote, tag } from "../support/ingredients";
import { base, form, fromResult, fromStatus, params, runMatrix, type MatrixContext, type MatrixRow } from "../support/matrix";
import { insertTestOrder, supplierWithEmail } from "../support/purchases";
import { referenceIds } from "../support/recipe-fixtures";

type Setup = Awaited<ReturnType<typeof productionSetup>> & { lotCode: string; lotId: string; supplierId: string };
const setups = new Map<string, Promise<Setup>>();

/** One released recipe, machine, scale, nib lot and sugar supplier per matrix team (made once). */
function setupFor({ team }: MatrixContext): Promise<Setup> {
  let s = setups.get(team.workspaceId);
  if (!s) {
    s = (async () => {
      const setup = await productionSetup(team);
      const lot = await lotWithNibs(team.workspaceId, "1000");
      const supplier = await supplierWithEmail(team.workspaceId);
      const { sugar } = await referenceIds(team.workspaceId);
      await db.update(ingredients).set({ preferredSupplierId: supplier.id }).where(eq(ingredients.id, sugar));
      await makeQuote(team.workspaceId, team.people.buyer.id, { supplierId: supplier.id, ingredientId: sugar, price: "24", unit: "per_pack", packKg: "25" });
      return { ...setup, lotCode: lot.code, lotId: lot.id, supplierId: supplier.id };
    })();
    setups.set(team.workspaceId, s);
  }
  return s;
}

async function plannedBatch(ctx: MatrixContext) {
  const setup = await setupFor(ctx);
  return { setup, batch: await planTestBatch(ctx.team, setup) };
}

const get = (path: string) => new Request(`${base}${path}`);

const rows: MatrixRow[] = [
  {
    name: "planBatchAction",
    permission: "batches.plan",
    outsider: "not_found", // the recipe, scale and machine are this workspace's
    run: async (ctx) => {
      const s = await setupFor(ctx);
      return fromResult(
        await planBatchAction(null, form({ recipeId: s.recipeId, amount: "12", unit: "kg", stationId: s.stationId, machineId: s.machineId, plannedFor: "2026-12-04" })),
      );
    },
  },
  {
    name: "recordRunAction",
    permission: "batches.plan",
    outsider: "not_found",
    run: async (ctx) => {
      const { setup, batch } = await plannedBatch(ctx);
      const detail = await readBatch({ workspaceId: ctx.team.workspaceId, batchId: batch.id });
      const portions = detail.lines.map((l) => ({
        batchLineId: l.id,
        actual: l.massGrams,
        unit: "g",
        lotCode: l.ingredientKind === "nibs" ? setup.lotCode : "",
      }));
      return fromResult(await recordRunAction({ batchId: batch.id, startedAt: "2026-12-03T08:00", endedAt: "2026-12-04T17:30", tolerancePercent: "2", portions }));
    },
  },
  {
    name: "cancelBatchAction",
    permission: "batches.plan",
    outsider: "not_found",
    run: async (ctx) => fromResult(await cancelBatchAction({ batchId: (await plannedBatch(ctx)).batch.id })),
  },
  {
    name: "createMachineAction",
    permission: "machines.manage",
    outsider: "ok", // adds to the caller's own workspace
    run: async () => fromResult(await createMachineAction(null, form({ name: `Refiner ${tag()}`, kind: "refiner", capacityKg: "10" }))),
  },
  {
    name: "createStationAction",
    permission: "machines.manage",
    outsider: "ok",
    run: async () => fromResult(await createStationAction(null, form({ name: `Scale ${tag()}`, resolutionGrams: "1", capacityKg: "" }))),
  },
  {
    name: "archiveMachineAction",
    permission: "machines.manage",
    outsider: "not_found",
    run: async ({ team }) => {
      const m = await createMachine({ workspaceId: team.workspaceId, name: `Conche ${tag()}`, kind: "conche", capacityKg: "50" });
      return fromResult(await archiveMachineAction({ machineId: m.id }));
    },
  },
  {
    name: "archiveStationAction",
    permission: "machines.manage",
    outsider: "not_found",
    run: async ({ team }) => {
      const s = await createStation({ workspaceId: team.workspaceId, name: `Floor scale ${tag()}`, resolutionGrams: "100", capacityKg: "150" });
      return fromResult(await archiveStationAction({ stationId: s.id }));
    },
  },
  {
    name: "draftPurchaseOrderAction",
    permission: "purchases.manage",
    outsider: "not_found",
    run: async (ctx) => {
      const { setup, batch } = await plannedBatch(ctx);
      const result = await draftPurchaseOrderAction({ supplierId: setup.supplierId, batchIds: [batch.id] });
      // Cancel it again, so the next caller's batch is not already covered by this order.
      if (result.ok) await cancelPurchaseOrder({ workspaceId: ctx.team.workspaceId, orderId: result.data.id });
      return fromResult(result);
    },
  },
  {
    name: "updatePurchaseOrderAction",
    permission: "purchases.manage",
    outsider: "not_found",
    run: async ({ team }) => {
      const order = await insertTestOrder(team.workspaceId);
      return fromResult(await updatePurchaseOrderAction({ orderId: order.id, notes: "Deliver to the back door.", lines: [{ lineId: order.lineId, quantityKg: "12", price: "2.4" }] }));
    },
  },
  {
    name: "sendPurchaseOrderAction",
    permission: "purchases.manage",
    outsider: "not_found",
    run: async ({ team }) => fromResult(await sendPurchaseOrderAction({ orderId: (await insertTestOrder(team.workspaceId)).id })),
  },
  {
    name: "receivePurchaseOrderAction",
    permission: "purchases.manage",
    outsider: "not_found",
    run: async ({ team }) => fromResult(await receivePurchaseOrderAction({ orderId: (await insertTestOrder(team.workspaceId, "sent")).id, receivedOn: "2026-12-10" })),
  },
  {
    name: "cancelPurchaseOrderAction",
    permission: "purchases.manage",
    outsider: "not_found",
    run: async ({ team }) => fromResult(await cancelPurchaseOrderAction({ orderId: (await insertTestOrder(team.workspaceId)).id })),
  },
  {
    name: "GET /api/batches",
    permission: "batches.read",
    outsider: "ok",
    run: async () => fromStatus((await getBatches(get("/api/batches?status=planned"), params())).status),
  },
  {
    name: "GET /api/batches?lotId= (recall)",
    permission: "batches.read",
    outsider: "not_found",
    run: async (ctx) => {
      const { lotId } = await setupFor(ctx);
      return fromStatus((await getBatches(get(`/api/batches?lotId=${lotId}`), params())).status);
    },
  },
  {
    name: "GET /api/batches/:batchId",
    permission: "batches.read",
    outsider: "not_found",
    run: async (ctx) => {
      const { batch } = await plannedBatch(ctx);
      return fromStatus((await getBatch(get(`/api/batches/${batch.id}`), params({ batchId: batch.id }))).status);
    },
  },
  {
    name: "GET /api/batches/preview",
    permission: "batches.plan",
    outsider: "not_found",
    run: async (ctx) => {
      const s = await setupFor(ctx);
      const q = new URLSearchParams({ recipeId: s.recipeId, amount: "2", unit: "t", stationId: s.stationId, machineId: s.machineId });
      return fromStatus((await getPreview(get(`/api/batches/preview?${q}`), params())).status);
    },
  },
  {
    name: "GET /api/batches/:batchId/pdf (permission gate)",
    permission: "batches.plan",
    // Printing needs the running app (the browser test prints for real). Here an unknown paper size
    // stops an allowed caller at validation (422, counted as passing the gate) before any browser starts.
    outsider: "ok",
    run: async (ctx) => {
      const { batch } = await plannedBatch(ctx);
      const status = (await getBatchPdf(get(`/api/batches/${batch.id}/pdf?paper=a5`), params({ batchId: batch.id }))).status;
      return status === 422 ? "ok" : fromStatus(status);
    },
  },
  {
    name: "GET /api/purchase-orders/:orderId/csv",
    permission: "purchases.manage",
    outsider: "not_found",
    run: async ({ team }) => {
      const order = await insertTestOrder(team.workspaceId);
      return fromStatus((await getOrderCsv(get(`/api/purchase-orders/${order.id}/csv`), params({ orderId: order.id }))).status);
    },
  },
];

runMatrix("batches", rows);
