import "server-only";
import { and, asc, desc, eq, inArray, type SQL } from "drizzle-orm";
import { db } from "@/db/client";
import { batches, batchLines, productionRuns, runLines, users, type Batch, type BatchLine, type BatchStatus } from "@/db/schema";
import { conflict, notFound } from "@/lib/errors";
import { plain } from "./numeric";

export type BatchListRow = {
  id: string;
  code: string;
  recipeId: string;
  recipeName: string;
  versionNo: number;
  plannedFor: string;
  totalMassGrams: string;
  loadCount: number;
  machineName: string | null;
  status: BatchStatus;
};

const listColumns = {
  id: batches.id,
  code: batches.code,
  recipeId: batches.recipeId,
  recipeName: batches.recipeName,
  versionNo: batches.versionNo,
  plannedFor: batches.plannedFor,
  totalMassGrams: batches.totalMassGrams,
  loadCount: batches.loadCount,
  machineName: batches.machineName,
  status: batches.status,
};

/** The workspace's batches, soonest plan first within status order (planned, completed, cancelled). */
export async function listBatches({
  workspaceId,
  status,
  ids,
  limit = 200,
}: {
  workspaceId: string;
  status?: BatchStatus;
  ids?: readonly string[];
  limit?: number;
}): Promise<BatchListRow[]> {
  if (ids && ids.length === 0) return [];
  const filters: SQL[] = [eq(batches.workspaceId, workspaceId)];
  if (status) filters.push(eq(batches.status, status));
  if (ids) filters.push(inArray(batches.id, [...ids]));
  const rows = await db
    .select(listColumns)
    .from(batches)
    .where(and(...filters))
    .orderBy(asc(batches.status), desc(batches.plannedFor), desc(batches.code))
    .limit(limit);
  return rows.map((r) => ({ ...r, totalMassGrams: plain(r.totalMassGrams) }));
}

export type RunPortion = { id: string; batchLineId: string; position: number; actualGrams: string; lotCode: string | null; lotId: string | null; consumesNibs: boolean };
export type RunRecord = {
  id: string;
  startedAt: Date;
  endedAt: Date;
  tolerancePercent: string;
  notes: string | null;
  recordedByName: string | null;
  portions: RunPortion[];
};
export type BatchDetail = Batch & { lines: BatchLine[]; run: RunRecord | null };

/** One batch with its lines and, once completed, its run; not found for another workspace's. */
export async function getBatch({ workspaceId, batchId }: { workspaceId: string; batchId: string }): Promise<BatchDetail> {
  const [batch] = await db
    .select()
    .from(batches)
    .where(and(eq(batches.workspaceId, workspaceId), eq(batches.id, batchId)));
  if (!batch) throw notFound("That batch");
  const [lines, [run]] = await Promise.all([
    db.select().from(batchLines).where(eq(batchLines.batchId, batch.id)).orderBy(asc(batchLines.position)),
    db
      .select({
        id: productionRuns.id,
        startedAt: productionRuns.startedAt,
        endedAt: productionRuns.endedAt,
        tolerancePercent: productionRuns.tolerancePercent,
        notes: productionRuns.notes,
        recordedByName: users.name,
      })
      .from(productionRuns)
      .leftJoin(users, eq(users.id, productionRuns.recordedById))
      .where(and(eq(productionRuns.workspaceId, workspaceId), eq(productionRuns.batchId, batch.id))),
  ]);
  const portions = run
    ? await db
        .select({
          id: runLines.id,
          batchLineId: runLines.batchLineId,
          position: runLines.position,
          actualGrams: runLines.actualGrams,
          lotCode: runLines.lotCode,
          lotId: runLines.lotId,
          consumesNibs: runLines.consumesNibs,
        })
        .from(runLines)
        .where(eq(runLines.runId, run.id))
        .orderBy(asc(runLines.position))
    : [];
  return {
    ...batch,
    totalMassGrams: plain(batch.totalMassGrams),
    requestedMassGrams: plain(batch.requestedMassGrams),
    resolutionGrams: plain(batch.resolutionGrams),
    requestedAmount: plain(batch.requestedAmount),
    lines: lines.map((l) => ({ ...l, percent: plain(l.percent), massGrams: plain(l.massGrams) })),
    run: run
      ? {
          ...run,
          tolerancePercent: plain(run.tolerancePercent),
          portions: portions.map((p) => ({ ...p, actualGrams: plain(p.actualGrams) })),
        }
      : null,
  };
}

/** Cancels a planned batch (a completed one is a record and stays). */
export async function cancelBatch({ workspaceId, batchId }: { workspaceId: string; batchId: string }): Promise<void> {
  const batch = await getBatch({ workspaceId, batchId });
  if (batch.status !== "planned") throw conflict(`Batch ${batch.code} is ${batch.status}; only a planned batch can be cancelled.`);
  const rows = await db
    .update(batches)
    .set({ status: "cancelled", cancelledAt: new Date() })
    .where(and(eq(batches.workspaceId, workspaceId), eq(batches.id, batchId), eq(batches.status, "planned")))
    .returning({ id: batches.id });
  if (rows.length === 0) throw conflict(`Batch ${batch.code} changed meanwhile. Reload the page.`);
}
