import "server-only";
import Decimal from "decimal.js";
import { and, asc, eq, inArray, sql } from "drizzle-orm";
import { db } from "@/db/client";
import { batches, batchLines, beanLots, productionRuns, runLines, stockMovements } from "@/db/schema";
import { conflict, invalid, notFound } from "@/lib/errors";
import type { RecordRunInput } from "@/lib/validation/batches";
import { getNibStock } from "./nib-stock";

type FieldErrors = Record<string, string[]>;

const toGrams = (actual: string, unit: "g" | "kg") => (unit === "kg" ? new Decimal(actual).times(1000) : new Decimal(actual));
const kg = (d: Decimal) => d.toFixed(3);

/**
 * Records what a batch's run actually used and completes the batch, in one
 * transaction: every line needs at least one weighed portion; nibs must come
 * from the workspace's bean lots and cannot exceed a lot's nibs in stock (the
 * lots' rows are locked, so two runs cannot take the same nibs); other lines
 * may carry a supplier's lot code and are taken off ingredient stock. A lot
 * code that names a bean lot is linked, so the lot's recall view finds it.
 */
export async function recordRun({ workspaceId, userId, input }: { workspaceId: string; userId: string | null; input: RecordRunInput }): Promise<{ runId: string }> {
  return db.transaction(async (tx) => {
    const [batch] = await tx
      .select({ id: batches.id, code: batches.code, status: batches.status })
      .from(batches)
      .where(and(eq(batches.workspaceId, workspaceId), eq(batches.id, input.batchId)))
      .for("update");
    if (!batch) throw notFound("That batch");
    if (batch.status !== "planned") throw conflict(`Batch ${batch.code} is already ${batch.status}; its run cannot be recorded again.`);
    const lines = await tx.select().from(batchLines).where(eq(batchLines.batchId, batch.id)).orderBy(asc(batchLines.position));
    const lineById = new Map(lines.map((l) => [l.id, l]));
    const errors: FieldErrors = {};
    const add = (path: string, message: string) => (errors[path] ??= []).push(message);

    input.portions.forEach((p, i) => {
      if (!lineById.has(p.batchLineId)) add(`portions.${i}.batchLineId`, "That line is not part of this batch. Reload the page.");
    });
    for (const line of lines) {
      if (!input.portions.some((p) => p.batchLineId === line.id)) add("_form", `Enter the actual mass of ${line.ingredientName}.`);
    }

    const codes = [...new Set(input.portions.map((p) => p.lotCode?.toLowerCase()).filter((c): c is string => !!c))];
    const lots = codes.length
      ? await tx
          .select({ id: beanLots.id, code: beanLots.code })
          .from(beanLots)
          .where(and(eq(beanLots.workspaceId, workspaceId), inArray(sql`lower(${beanLots.code})`, codes)))
          .orderBy(asc(beanLots.id))
          .for("update")
      : [];
    const lotByCode = new Map(lots.map((l) => [l.code.toLowerCase(), l]));

    const taken = new Map<string, { grams: Decimal; firstIndex: number }>();
    const rows = input.portions.map((p, i) => {
      const line = lineById.get(p.batchLineId);
      const lot = p.lotCode ? lotByCode.get(p.lotCode.toLowerCase()) : undefined;
      const grams = toGrams(p.actual, p.unit);
      const consumesNibs = line?.ingredientKind === "nibs";
      if (consumesNibs && !lot) {
        add(`portions.${i}.lotCode`, p.lotCode ? `${p.lotCode} is not one of your bean lots.` : "Nibs come from a bean lot: enter its code.");
      }
      if (consumesNibs && lot) {
        const t = taken.get(lot.id) ?? { grams: new Decimal(0), firstIndex: i };
        taken.set(lot.id, { ...t, grams: t.grams.plus(grams) });
      }
      return { line, lot, grams, consumesNibs: consumesNibs && !!lot, lotCode: lot?.code ?? p.lotCode ?? null };
    });

    if (taken.size > 0) {
      const stock = await getNibStock({ workspaceId, lotIds: [...taken.keys()], executor: tx });
      for (const [lotId, t] of taken) {
        const s = stock.get(lotId)!;
        const takenKg = t.grams.div(1000);
        if (takenKg.gt(s.inStockKg)) {
          const why = s.winnowed ? `has ${kg(new Decimal(s.inStockKg))} kg of nibs in stock` : "has no nibs yet (winnowing is not recorded)";
          add(`portions.${t.firstIndex}.lotCode`, `${s.code} ${why}; this run takes ${kg(takenKg)} kg.`);
        }
      }
    }
    if (Object.keys(errors).length > 0) {
      throw invalid(errors._form?.[0] ?? "Check the highlighted fields.", errors);
    }

    const [run] = await tx
      .insert(productionRuns)
      .values({
        workspaceId,
        batchId: batch.id,
        startedAt: input.startedAt,
        endedAt: input.endedAt,
        tolerancePercent: input.tolerancePercent,
        notes: input.notes,
        recordedById: userId,
      })
      .returning({ id: productionRuns.id });
    await tx.insert(runLines).values(
      rows.map((r, i) => ({
        workspaceId,
        runId: run!.id,
        batchLineId: r.line!.id,
        position: i + 1,
        actualGrams: r.grams.toFixed(),
        lotCode: r.lotCode,
        lotId: r.lot?.id ?? null,
        consumesNibs: r.consumesNibs,
      })),
    );
    // Everything not taken from a bean lot's nibs comes off the ingredient stock ledger, one movement per line.
    const usedByLine = new Map<string, Decimal>();
    for (const r of rows) if (!r.consumesNibs) usedByLine.set(r.line!.id, (usedByLine.get(r.line!.id) ?? new Decimal(0)).plus(r.grams));
    const movements = [...usedByLine].map(([lineId, grams]) => ({
      workspaceId,
      ingredientId: lineById.get(lineId)!.ingredientId,
      kind: "used" as const,
      massKg: grams.div(1000).negated().toFixed(3),
      runId: run!.id,
      note: `Batch ${batch.code}`,
    }));
    if (movements.length) await tx.insert(stockMovements).values(movements);
    await tx.update(batches).set({ status: "completed" }).where(eq(batches.id, batch.id));
    return { runId: run!.id };
  });
}
