import "server-only";
import Decimal from "decimal.js";
import { and, asc, desc, eq, inArray, isNull } from "drizzle-orm";
import { db } from "@/db/client";
import { beanLots, cutTests, exchangeRates, lotCosts, processingRecords, roastPresets, suppliers, users, workspaces } from "@/db/schema";
import { conflict, notFound } from "@/lib/errors";
import { nibCostPerKg, summariseChain, type ChainSummary } from "@/lib/formulation";
import { toBase, type DatedRate } from "@/lib/pricing/convert";
import type { CreateLotInput } from "@/lib/validation/lots";
import { isUniqueViolation } from "./pg-errors";

export type NibCost = { perKg: string | null; estimated: boolean; problem?: string };

export type LotListItem = {
  id: string;
  code: string;
  originCountry: string;
  producer: string | null;
  supplierName: string | null;
  arrivedOn: string;
  massReceivedKg: string;
  chain: ChainSummary;
  nibCost: NibCost;
};

/** Creates a lot with its freight and duty as cost lines, in one transaction. */
export async function createLot({ workspaceId, userId, input }: { workspaceId: string; userId: string; input: CreateLotInput }) {
  if (input.supplierId) await requireSupplier(workspaceId, input.supplierId);
  try {
    return await db.transaction(async (tx) => {
      const [lot] = await tx
        .insert(beanLots)
        .values({
          workspaceId,
          code: input.code,
          supplierId: input.supplierId ?? null,
          originCountry: input.originCountry,
          originRegion: input.originRegion ?? null,
          producer: input.producer ?? null,
          harvestYear: input.harvestYear ?? null,
          arrivedOn: input.arrivedOn,
          massReceivedKg: input.massReceivedKg,
          pricePaid: input.pricePaid,
          currency: input.currency,
          moisturePercent: input.moisturePercent ?? null,
          notes: input.notes ?? null,
          createdById: userId,
        })
        .returning({ id: beanLots.id });
      const extras = [
        ["Freight", input.freight],
        ["Duty", input.duty],
      ].filter((e): e is [string, string] => !!e[1]);
      for (const [label, amount] of extras) {
        await tx.insert(lotCosts).values({ workspaceId, lotId: lot!.id, label, amount, currency: input.currency });
      }
      return { id: lot!.id };
    });
  } catch (err) {
    if (isUniqueViolation(err, "bean_lots_workspace_code")) throw conflict(`A lot with the code ${input.code} already exists.`);
    throw err;
  }
}

async function requireSupplier(workspaceId: string, supplierId: string) {
  const [s] = await db
    .select({ id: suppliers.id })
    .from(suppliers)
    .where(and(eq(suppliers.id, supplierId), eq(suppliers.workspaceId, workspaceId)));
  if (!s) throw notFound("That supplier");
}

/** The lot's row, or a not-found error (also for another workspace's lot). */
export async function requireLot({ workspaceId, lotId }: { workspaceId: string; lotId: string }) {
  const [lot] = await db
    .select()
    .from(beanLots)
    .where(and(eq(beanLots.id, lotId), eq(beanLots.workspaceId, workspaceId)));
  if (!lot) throw notFound("That lot");
  return lot;
}

async function workspaceContext(workspaceId: string) {
  const [ws] = await db
    .select({ base: workspaces.baseCurrency, estimate: workspaces.estimatedNibYieldPercent })
    .from(workspaces)
    .where(eq(workspaces.id, workspaceId));
  const rates: DatedRate[] = await db
    .select({ currency: exchangeRates.currency, rateToBase: exchangeRates.rateToBase, validOn: exchangeRates.validOn })
    .from(exchangeRates)
    .where(eq(exchangeRates.workspaceId, workspaceId));
  return { base: ws?.base ?? "EUR", estimate: ws?.estimate ?? "78", rates };
}

/**
 * Cost per kg of nibs in the base currency: price paid and extra costs
 * converted at the arrival date's exchange rate, plus recorded processing costs
 * (already in base currency), over the nib mass (recorded or estimated).
 */
function costNibs(
  lot: { pricePaid: string; currency: string; arrivedOn: string },
  costs: { amount: string; currency: string }[],
  processingCosts: string[],
  chain: ChainSummary,
  ctx: { base: string; rates: DatedRate[] },
): NibCost {
  const amounts: string[] = [];
  for (const c of [{ amount: lot.pricePaid, currency: lot.currency }, ...costs]) {
    const converted = toBase(c.amount, c.currency, { base: ctx.base, rates: ctx.rates, on: lot.arrivedOn });
    if (!converted.ok) return { perKg: null, estimated: chain.nibMassEstimated, problem: converted.reason };
    amounts.push(converted.value.amount);
  }
  const [price, ...extras] = amounts;
  const perKg = nibCostPerKg({ pricePaid: price!, extraCosts: extras, processingCosts, nibMassKg: chain.nibMassKg });
  return { perKg, estimated: chain.nibMassEstimated, problem: perKg ? undefined : "No nibs yet." };
}

/** Every lot of the workspace, newest arrival first, with its chain summary and nib cost. */
export async function listLots({ workspaceId }: { workspaceId: string }): Promise<LotListItem[]> {
  const ctx = await workspaceContext(workspaceId);
  const lots = await db
    .select({ lot: beanLots, supplierName: suppliers.name })
    .from(beanLots)
    .leftJoin(suppliers, eq(suppliers.id, beanLots.supplierId))
    .where(and(eq(beanLots.workspaceId, workspaceId), isNull(beanLots.archivedAt)))
    .orderBy(desc(beanLots.arrivedOn), asc(beanLots.code));
  if (lots.length === 0) return [];
  const ids = lots.map((l) => l.lot.id);
  const [records, costs] = await Promise.all([
    db.select().from(processingRecords).where(inArray(processingRecords.lotId, ids)),
    db.select().from(lotCosts).where(inArray(lotCosts.lotId, ids)),
  ]);
  return lots.map(({ lot, supplierName }) => {
    const recs = records.filter((r) => r.lotId === lot.id);
    const chain = summariseChain({ massReceivedKg: lot.massReceivedKg, records: recs, estimatedNibYieldPercent: ctx.estimate });
    const nibCost = costNibs(
      lot,
      costs.filter((c) => c.lotId === lot.id),
      recs.map((r) => r.cost).filter((c): c is string => !!c),
      chain,
      ctx,
    );
    return {
      id: lot.id,
      code: lot.code,
      originCountry: lot.originCountry,
      producer: lot.producer,
      supplierName,
      arrivedOn: lot.arrivedOn,
      massReceivedKg: lot.massReceivedKg,
      chain,
      nibCost,
    };
  });
}

/** One lot with everything its page shows. */
export async function getLotDetail({ workspaceId, lotId }: { workspaceId: string; lotId: string }) {
  const lot = await requireLot({ workspaceId, lotId });
  const ctx = await workspaceContext(workspaceId);
  const [supplier, costs, tests, records] = await Promise.all([
    lot.supplierId
      ? db.select({ name: suppliers.name }).from(suppliers).where(eq(suppliers.id, lot.supplierId)).then((r) => r[0] ?? null)
      : Promise.resolve(null),
    db.select().from(lotCosts).where(eq(lotCosts.lotId, lot.id)).orderBy(asc(lotCosts.createdAt)),
    db.select().from(cutTests).where(eq(cutTests.lotId, lot.id)).orderBy(desc(cutTests.testedOn)),
    db
      .select({ record: processingRecords, performedBy: users.name })
      .from(processingRecords)
      .leftJoin(users, eq(users.id, processingRecords.performedById))
      .where(eq(processingRecords.lotId, lot.id))
      .orderBy(asc(processingRecords.performedOn), asc(processingRecords.createdAt)),
  ]);
  const chain = summariseChain({
    massReceivedKg: lot.massReceivedKg,
    records: records.map((r) => r.record),
    estimatedNibYieldPercent: ctx.estimate,
  });
  const nibCost = costNibs(
    lot,
    costs,
    records.map((r) => r.record.cost).filter((c): c is string => !!c),
    chain,
    ctx,
  );
  const processingCosts = records.map((r) => r.record.cost).filter((c): c is string => !!c);
  const processingCost = processingCosts.length ? processingCosts.reduce((s, c) => new Decimal(s).plus(c).toFixed()) : null;
  return { lot, supplierName: supplier?.name ?? null, costs, cutTests: tests, records, chain, nibCost, processingCost, baseCurrency: ctx.base };
}

export async function addLotCost(input: { workspaceId: string; lotId: string; label: string; amount: string; currency: string }) {
  await requireLot(input);
  await db.insert(lotCosts).values(input);
}

export async function recordCutTest(input: {
  workspaceId: string;
  userId: string;
  lotId: string;
  testedOn: string;
  sampleSize: number;
  wellFermented: number;
  partlyFermented: number;
  slaty: number;
  mouldy: number;
  insectDamaged: number;
  germinated: number;
  notes?: string;
}) {
  await requireLot(input);
  const { userId, ...rest } = input;
  await db.insert(cutTests).values({ ...rest, notes: rest.notes ?? null, testedById: userId });
}

/**
 * Records a processing step once: a second submit with the same submission key
 * returns the first record instead of adding another.
 */
export async function recordProcessing(input: typeof processingRecords.$inferInsert): Promise<{ id: string; created: boolean }> {
  await requireLot({ workspaceId: input.workspaceId, lotId: input.lotId });
  if (input.roastPresetId) {
    const [p] = await db
      .select({ id: roastPresets.id })
      .from(roastPresets)
      .where(and(eq(roastPresets.id, input.roastPresetId), eq(roastPresets.workspaceId, input.workspaceId)));
    if (!p) throw notFound("That roast preset");
  }
  const [row] = await db
    .insert(processingRecords)
    .values(input)
    .onConflictDoNothing({ target: [processingRecords.workspaceId, processingRecords.submissionKey] })
    .returning({ id: processingRecords.id });
  if (row) return { id: row.id, created: true };
  const [existing] = await db
    .select({ id: processingRecords.id, lotId: processingRecords.lotId })
    .from(processingRecords)
    .where(and(eq(processingRecords.workspaceId, input.workspaceId), eq(processingRecords.submissionKey, input.submissionKey)));
  if (!existing || existing.lotId !== input.lotId) throw conflict("This form was already used for another record. Reload the page.");
  return { id: existing.id, created: false };
}

export async function listRoastPresets({ workspaceId }: { workspaceId: string }) {
  return db.select().from(roastPresets).where(eq(roastPresets.workspaceId, workspaceId)).orderBy(asc(roastPresets.name));
}

export async function createRoastPreset(input: { workspaceId: string; name: string; temperatureC: string; minutes: string; notes?: string }) {
  try {
    const [row] = await db
      .insert(roastPresets)
      .values({ ...input, notes: input.notes ?? null })
      .returning({ id: roastPresets.id });
    return { id: row!.id };
  } catch (err) {
    if (isUniqueViolation(err, "roast_presets_workspace_name")) throw conflict(`A roast preset named ${input.name} already exists.`);
    throw err;
  }
}

export type NibSource = { lotId: string; code: string; originCountry: string; perKg: string; estimated: boolean };

/** Lots whose nibs can price a recipe line: each with its nib cost per kg in base currency. */
export async function listNibSources({ workspaceId }: { workspaceId: string }): Promise<NibSource[]> {
  return (await listLots({ workspaceId }))
    .filter((l) => l.nibCost.perKg)
    .map((l) => ({ lotId: l.id, code: l.code, originCountry: l.originCountry, perKg: l.nibCost.perKg!, estimated: l.nibCost.estimated }));
}
