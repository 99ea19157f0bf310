import "server-only";
import Decimal from "decimal.js";
import { and, eq, inArray, isNull, sql } from "drizzle-orm";
import { db } from "@/db/client";
import { batches, beanLots, processingRecords, productionRuns, runLines, workspaces } from "@/db/schema";
import { summariseChain } from "@/lib/formulation";
import type { Executor } from "./recipes-db";

export type NibStock = {
  lotId: string;
  code: string;
  /** Nibs out of winnowing as recorded; 0 until winnowing is recorded (no nibs exist yet). */
  producedKg: string;
  /** Nibs taken by completed runs. */
  usedKg: string;
  /** produced − used. */
  inStockKg: string;
  winnowed: boolean;
};

const kg = (d: Decimal) => (d.isZero() ? "0" : d.toFixed());

/**
 * Nibs in stock per bean lot: the nibs winnowing produced (recorded, never the
 * estimate — unwinnowed beans are not nibs yet) less the nibs completed runs
 * took from the lot. Pass `executor` inside a transaction that holds the lots'
 * row locks, so two runs cannot both take the same nibs.
 */
export async function getNibStock({
  workspaceId,
  lotIds,
  executor = db,
}: {
  workspaceId: string;
  lotIds?: readonly string[];
  executor?: Executor;
}): Promise<Map<string, NibStock>> {
  if (lotIds && lotIds.length === 0) return new Map();
  const scope = and(eq(beanLots.workspaceId, workspaceId), lotIds ? inArray(beanLots.id, [...lotIds]) : isNull(beanLots.archivedAt));
  const lots = await executor.select({ id: beanLots.id, code: beanLots.code, massReceivedKg: beanLots.massReceivedKg }).from(beanLots).where(scope);
  if (lots.length === 0) return new Map();
  const ids = lots.map((l) => l.id);
  // One after another: inside a transaction the queries share one connection.
  const records = await executor
    .select()
    .from(processingRecords)
    .where(and(eq(processingRecords.workspaceId, workspaceId), inArray(processingRecords.lotId, ids)));
  const used = await executor
    .select({ lotId: runLines.lotId, grams: sql<string>`sum(${runLines.actualGrams})` })
    .from(runLines)
    .innerJoin(productionRuns, eq(productionRuns.id, runLines.runId))
    .innerJoin(batches, and(eq(batches.id, productionRuns.batchId), eq(batches.status, "completed")))
    .where(and(eq(runLines.workspaceId, workspaceId), eq(runLines.consumesNibs, true), inArray(runLines.lotId, ids)))
    .groupBy(runLines.lotId);
  const [ws] = await executor.select({ estimate: workspaces.estimatedNibYieldPercent }).from(workspaces).where(eq(workspaces.id, workspaceId));
  const usedByLot = new Map(used.map((u) => [u.lotId, new Decimal(u.grams).div(1000)]));
  const out = new Map<string, NibStock>();
  for (const lot of lots) {
    const chain = summariseChain({
      massReceivedKg: lot.massReceivedKg,
      records: records.filter((r) => r.lotId === lot.id),
      estimatedNibYieldPercent: ws?.estimate ?? "78",
    });
    const produced = chain.nibMassEstimated ? new Decimal(0) : new Decimal(chain.nibMassKg);
    const usedKg = usedByLot.get(lot.id) ?? new Decimal(0);
    out.set(lot.id, {
      lotId: lot.id,
      code: lot.code,
      producedKg: kg(produced),
      usedKg: kg(usedKg),
      inStockKg: kg(produced.minus(usedKg)),
      winnowed: !chain.nibMassEstimated,
    });
  }
  return out;
}

/** One lot's nib stock (a not-found lot gives null). */
export async function getLotNibStock({ workspaceId, lotId }: { workspaceId: string; lotId: string }): Promise<NibStock | null> {
  return (await getNibStock({ workspaceId, lotIds: [lotId] })).get(lotId) ?? null;
}
