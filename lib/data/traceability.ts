import "server-only";
import { and, asc, desc, eq } from "drizzle-orm";
import { db } from "@/db/client";
import { batches, batchLines, beanLots, productionRuns, runLines } from "@/db/schema";
import { sumGrams } from "@/lib/batches/deviation";

export type BatchLotUse = {
  /** Set when the code is one of the workspace's bean lots. */
  lotId: string | null;
  code: string;
  ingredientName: string;
  grams: string;
  consumesNibs: boolean;
};

/** Batch → lots: every lot code a completed run recorded, per ingredient, with the mass taken. */
export async function lotsOfBatch({ workspaceId, batchId }: { workspaceId: string; batchId: string }): Promise<BatchLotUse[]> {
  const rows = await db
    .select({
      lotId: runLines.lotId,
      lotCode: runLines.lotCode,
      beanLotCode: beanLots.code,
      ingredientName: batchLines.ingredientName,
      position: batchLines.position,
      grams: runLines.actualGrams,
      consumesNibs: runLines.consumesNibs,
    })
    .from(runLines)
    .innerJoin(productionRuns, eq(productionRuns.id, runLines.runId))
    .innerJoin(batchLines, eq(batchLines.id, runLines.batchLineId))
    .leftJoin(beanLots, eq(beanLots.id, runLines.lotId))
    .where(and(eq(runLines.workspaceId, workspaceId), eq(productionRuns.batchId, batchId)))
    .orderBy(asc(batchLines.position), asc(runLines.position));
  const merged = new Map<string, BatchLotUse & { parts: string[] }>();
  for (const r of rows) {
    const code = r.beanLotCode ?? r.lotCode;
    if (!code) continue;
    const key = `${r.ingredientName}\u0000${code}`;
    const entry = merged.get(key) ?? { lotId: r.lotId, code, ingredientName: r.ingredientName, grams: "0", consumesNibs: r.consumesNibs, parts: [] };
    entry.parts.push(r.grams);
    merged.set(key, entry);
  }
  return [...merged.values()].map(({ parts, ...e }) => ({ ...e, grams: sumGrams(parts) }));
}

export type LotBatchUse = {
  batchId: string;
  code: string;
  recipeName: string;
  versionNo: number;
  endedAt: Date;
  ingredientName: string;
  grams: string;
};

/**
 * Lot → batches, the recall question: every batch whose completed run took
 * something from this bean lot, newest first, with what it took.
 */
export async function batchesUsingLot({ workspaceId, lotId }: { workspaceId: string; lotId: string }): Promise<LotBatchUse[]> {
  const rows = await db
    .select({
      batchId: batches.id,
      code: batches.code,
      recipeName: batches.recipeName,
      versionNo: batches.versionNo,
      endedAt: productionRuns.endedAt,
      ingredientName: batchLines.ingredientName,
      grams: runLines.actualGrams,
    })
    .from(runLines)
    .innerJoin(productionRuns, eq(productionRuns.id, runLines.runId))
    .innerJoin(batches, eq(batches.id, productionRuns.batchId))
    .innerJoin(batchLines, eq(batchLines.id, runLines.batchLineId))
    .where(and(eq(runLines.workspaceId, workspaceId), eq(batches.workspaceId, workspaceId), eq(runLines.lotId, lotId)))
    .orderBy(desc(productionRuns.endedAt), asc(batches.code), asc(batchLines.position));
  const merged = new Map<string, LotBatchUse & { parts: string[] }>();
  for (const r of rows) {
    const key = `${r.batchId}\u0000${r.ingredientName}`;
    const entry = merged.get(key) ?? { ...r, parts: [] };
    entry.parts.push(r.grams);
    merged.set(key, entry);
  }
  return [...merged.values()].map(({ parts, ...e }) => ({ ...e, grams: sumGrams(parts) }));
}
