/**
 * Demo production of Fenwick Lane Chocolate Works: two 10 kg stone refiners, a
 * 60 kg refiner, a 25 kg tempering machine, a bench and a floor scale; a
 * completed run of the house dark using lot EC-2026-07's nibs, a planned milk
 * batch, opening stock, and a drafted and a sent purchase order. Supplier lot
 * codes, masses and stock are invented demo data. Idempotent: machines and
 * scales match on name, batches on code, orders on number. Without a released
 * recipe (the recipes seeder not run) only machines, scales and stock are added.
 */
import { and, asc, eq, inArray, isNotNull } from "drizzle-orm";
import Decimal from "decimal.js";
import { buildPlan, batchLineRowsOf, batchRowOf, type ScaledPlan } from "../../lib/batches/build-plan";
import { currentQuote, isoDay } from "../../lib/pricing/convert";
import { lineAmount, orderQuantity } from "../../lib/purchasing/order-quantity";
import {
  batches,
  batchLines,
  beanLots,
  ingredients,
  machines,
  priceQuotes,
  productionRuns,
  purchaseOrderBatches,
  purchaseOrderLines,
  purchaseOrders,
  recipes,
  recipeVersionLines,
  recipeVersions,
  runLines,
  stockMovements,
  suppliers,
  weighingStations,
} from "../schema";
import type { DemoContext, DemoSeeder } from "./context";

type Tx = DemoContext["tx"];

const MACHINES = [
  { name: "Stone refiner A", kind: "refiner" as const, capacityKg: "10" },
  { name: "Stone refiner B", kind: "refiner" as const, capacityKg: "10" },
  { name: "Large refiner", kind: "refiner" as const, capacityKg: "60" },
  { name: "Tempering machine", kind: "tempering" as const, capacityKg: "25" },
];
const STATIONS = [
  { name: "Bench scale", resolutionGrams: "1", capacityKg: "15" },
  { name: "Floor scale", resolutionGrams: "100", capacityKg: "150" },
];
// Opening stock counted on the demo's first day (invented demo data), by library name.
const OPENING_STOCK: [string, string][] = [
  ["Sugar (sucrose)", "40"],
  ["Cocoa butter", "25"],
  ["Soy lecithin", "2"],
  ["Whole milk powder", "5"],
  ["Vanilla (ground pods)", "0.5"],
];

async function namedIds(tx: Tx, workspaceId: string) {
  const m = await tx.select({ id: machines.id, name: machines.name }).from(machines).where(eq(machines.workspaceId, workspaceId));
  const s = await tx.select({ id: weighingStations.id, name: weighingStations.name }).from(weighingStations).where(eq(weighingStations.workspaceId, workspaceId));
  return { machineIds: new Map(m.map((r) => [r.name, r.id])), stationIds: new Map(s.map((r) => [r.name, r.id])) };
}

/** The current released version of a demo recipe, as the plan builder reads it; null when there is none. */
async function releasedVersion(tx: Tx, workspaceId: string, name: string) {
  const [r] = await tx
    .select({ id: recipes.id, name: recipes.name, chocolateType: recipes.chocolateType, versionNo: recipes.releasedVersionNo })
    .from(recipes)
    .where(and(eq(recipes.workspaceId, workspaceId), eq(recipes.name, name), isNotNull(recipes.releasedVersionNo)));
  if (!r?.versionNo) return null;
  const [v] = await tx
    .select({ id: recipeVersions.id, barMassGrams: recipeVersions.barMassGrams })
    .from(recipeVersions)
    .where(and(eq(recipeVersions.recipeId, r.id), eq(recipeVersions.versionNo, r.versionNo)));
  const lines = await tx
    .select({ ingredientId: recipeVersionLines.ingredientId, name: recipeVersionLines.ingredientName, percent: recipeVersionLines.percent, allergens: recipeVersionLines.allergens, kind: ingredients.kind })
    .from(recipeVersionLines)
    .innerJoin(ingredients, eq(ingredients.id, recipeVersionLines.ingredientId))
    .where(eq(recipeVersionLines.versionId, v!.id))
    .orderBy(asc(recipeVersionLines.position));
  return {
    recipe: { id: r.id, name: r.name, chocolateType: r.chocolateType },
    version: { id: v!.id, versionNo: r.versionNo, barMassGrams: new Decimal(v!.barMassGrams).toFixed(), lines: lines.map((l) => ({ ...l, percent: new Decimal(l.percent).toFixed() })) },
    kinds: new Map(lines.map((l) => [l.ingredientId, l.kind])),
  };
}

/** Inserts a planned batch under a fixed demo code; returns its id, or null when it was seeded before. */
async function insertBatch(tx: Tx, ctx: DemoContext, code: string, plan: ScaledPlan, extra: { plannedFor: string; amount: string; refiningHours: string; conchingHours: string; notes: string }) {
  const inserted = await tx
    .insert(batches)
    .values({
      ...batchRowOf(plan),
      workspaceId: ctx.workspaceId,
      code,
      plannedFor: extra.plannedFor,
      requestedAmount: extra.amount,
      requestedUnit: "kg",
      refiningHours: extra.refiningHours,
      conchingHours: extra.conchingHours,
      notes: extra.notes,
      createdById: ctx.people.production,
    })
    .onConflictDoNothing({ target: [batches.workspaceId, batches.code] })
    .returning({ id: batches.id });
  if (!inserted[0]) return null;
  await tx.insert(batchLines).values(batchLineRowsOf(inserted[0].id, plan));
  return inserted[0].id;
}

/** The completed run of the house dark: nibs from EC-2026-07, sugar 1.4 % over plan (flagged at a 1 % tolerance). */
async function completeHouseDark(tx: Tx, ctx: DemoContext, batchId: string) {
  const [lot] = await tx.select({ id: beanLots.id, code: beanLots.code }).from(beanLots).where(and(eq(beanLots.workspaceId, ctx.workspaceId), eq(beanLots.code, "EC-2026-07")));
  if (!lot) return;
  const lines = await tx.select().from(batchLines).where(eq(batchLines.batchId, batchId)).orderBy(asc(batchLines.position));
  const [run] = await tx
    .insert(productionRuns)
    .values({
      workspaceId: ctx.workspaceId,
      batchId,
      startedAt: new Date("2026-11-23T07:30:00Z"),
      endedAt: new Date("2026-11-25T15:10:00Z"),
      tolerancePercent: "1",
      notes: "Demo data: two loads on stone refiner A, 20 h refining each.",
      recordedById: ctx.people.production,
    })
    .returning({ id: productionRuns.id });
  const actual = (l: (typeof lines)[number]) => (l.ingredientKind === "sugar" ? new Decimal(l.massGrams).times("1.014").round() : new Decimal(l.massGrams)).toFixed();
  const lotCode = (kind: string) => ({ nibs: lot.code, sugar: "SSC-26-1041", cocoa_butter: "BWB-2609-12", lecithin: "TFI-L-0388" })[kind] ?? null;
  await tx.insert(runLines).values(
    lines.map((l, i) => ({
      workspaceId: ctx.workspaceId,
      runId: run!.id,
      batchLineId: l.id,
      position: i + 1,
      actualGrams: actual(l),
      lotCode: lotCode(l.ingredientKind),
      lotId: l.ingredientKind === "nibs" ? lot.id : null,
      consumesNibs: l.ingredientKind === "nibs",
    })),
  );
  const used = lines.filter((l) => l.ingredientKind !== "nibs");
  await tx.insert(stockMovements).values(
    used.map((l) => ({ workspaceId: ctx.workspaceId, ingredientId: l.ingredientId, kind: "used" as const, massKg: new Decimal(actual(l)).div(1000).negated().toFixed(3), runId: run!.id, note: "Batch B-2026-0001" })),
  );
  await tx.update(batches).set({ status: "completed" }).where(eq(batches.id, batchId));
}

/** An order line priced from the supplier's current demo quote, rounded up to its packs. */
async function orderLine(tx: Tx, ctx: DemoContext, supplierId: string, ingredientName: string, neededKg: string) {
  const [ing] = await tx.select({ id: ingredients.id, name: ingredients.name }).from(ingredients).where(and(eq(ingredients.workspaceId, ctx.workspaceId), eq(ingredients.name, ingredientName)));
  if (!ing) return null;
  const quotes = await tx.select().from(priceQuotes).where(and(eq(priceQuotes.ingredientId, ing.id), eq(priceQuotes.supplierId, supplierId)));
  const q = currentQuote(quotes, isoDay(new Date()));
  const order = orderQuantity({ neededKg, packKg: q?.packKg, minimumOrderKg: q?.minimumOrderKg });
  return {
    ingredientId: ing.id,
    ingredientName: ing.name,
    neededKg,
    quantityKg: order.quantityKg,
    packs: order.packs,
    packKg: q?.packKg ?? null,
    minimumOrderKg: q?.minimumOrderKg ?? null,
    price: q?.price ?? null,
    currency: q?.currency ?? null,
    priceUnit: q?.unit ?? null,
    quoteId: q?.id ?? null,
    amount: q ? lineAmount({ quantityKg: order.quantityKg, price: q.price, unit: q.unit, packKg: q.packKg }) : null,
  };
}

async function seedOrder(tx: Tx, ctx: DemoContext, o: { number: string; supplier: string; status: "drafted" | "sent"; lines: [string, string][]; batchId: string | null }) {
  const [supplier] = await tx.select({ id: suppliers.id, email: suppliers.email }).from(suppliers).where(and(eq(suppliers.workspaceId, ctx.workspaceId), eq(suppliers.name, o.supplier)));
  if (!supplier) return;
  const lines = [];
  for (const [name, kg] of o.lines) {
    const line = await orderLine(tx, ctx, supplier.id, name, kg);
    if (line) lines.push(line);
  }
  if (lines.length === 0) return;
  const sent = o.status === "sent" ? { sentAt: new Date("2026-11-27T09:12:00Z"), sentTo: supplier.email } : {};
  const inserted = await tx
    .insert(purchaseOrders)
    .values({ workspaceId: ctx.workspaceId, number: o.number, supplierId: supplier.id, status: o.status, createdById: ctx.people.buyer, ...sent })
    .onConflictDoNothing({ target: [purchaseOrders.workspaceId, purchaseOrders.number] })
    .returning({ id: purchaseOrders.id });
  if (!inserted[0]) return;
  await tx.insert(purchaseOrderLines).values(lines.map(({ amount: _a, ...l }, i) => ({ ...l, orderId: inserted[0]!.id, position: i + 1 })));
  if (o.batchId) await tx.insert(purchaseOrderBatches).values({ orderId: inserted[0].id, batchId: o.batchId });
}

export const seedBatches: DemoSeeder = async (ctx) => {
  const { tx, workspaceId } = ctx;
  await tx.insert(machines).values(MACHINES.map((m) => ({ workspaceId, ...m }))).onConflictDoNothing({ target: [machines.workspaceId, machines.name] });
  await tx.insert(weighingStations).values(STATIONS.map((s) => ({ workspaceId, ...s }))).onConflictDoNothing({ target: [weighingStations.workspaceId, weighingStations.name] });
  const [opening] = await tx.select({ id: stockMovements.id }).from(stockMovements).where(and(eq(stockMovements.workspaceId, workspaceId), eq(stockMovements.kind, "opening"))).limit(1);
  if (!opening) {
    const lib = await tx.select({ id: ingredients.id, name: ingredients.name }).from(ingredients).where(and(eq(ingredients.workspaceId, workspaceId), inArray(ingredients.name, OPENING_STOCK.map(([n]) => n))));
    const rows = OPENING_STOCK.flatMap(([name, kg]) => lib.filter((i) => i.name === name).map((i) => ({ workspaceId, ingredientId: i.id, kind: "opening" as const, massKg: kg, note: "Opening stock (demo data)" })));
    if (rows.length) await tx.insert(stockMovements).values(rows);
  }
  const { machineIds, stationIds } = await namedIds(tx, workspaceId);
  const bench = { id: stationIds.get("Bench scale")!, ...STATIONS[0]! };
  const refinerA = { id: machineIds.get("Stone refiner A")!, ...MACHINES[0]! };

  const dark = await releasedVersion(tx, workspaceId, "House dark 70 %");
  if (dark) {
    const built = buildPlan({ ...dark, station: bench, machine: refinerA, massKg: "20" });
    if (built.ok) {
      const id = await insertBatch(tx, ctx, "B-2026-0001", built.plan, { plannedFor: "2026-11-23", amount: "20", refiningHours: "20", conchingHours: "24", notes: "Demo data." });
      if (id) await completeHouseDark(tx, ctx, id);
    }
  }
  const milk = await releasedVersion(tx, workspaceId, "Harbour milk 45 %");
  let milkBatchId: string | null;
  if (milk) {
    const built = buildPlan({ ...milk, station: bench, machine: refinerA, massKg: "40" });
    if (built.ok) {
      milkBatchId =
        (await insertBatch(tx, ctx, "B-2026-0002", built.plan, { plannedFor: "2026-12-08", amount: "40", refiningHours: "22", conchingHours: "18", notes: "Demo data: for the winter market." })) ??
        (await tx.select({ id: batches.id }).from(batches).where(and(eq(batches.workspaceId, workspaceId), eq(batches.code, "B-2026-0002"))))[0]?.id ??
        null;
      // The milk powder this batch lacks after the opening stock: 40 kg × 22 % = 8.8 kg, 5 kg on hand.
      await seedOrder(tx, ctx, { number: "PO-2026-0001", supplier: "Holloway Dairy Powders", status: "drafted", lines: [["Whole milk powder", "3.8"]], batchId: milkBatchId });
    }
  }
  await seedOrder(tx, ctx, { number: "PO-2026-0002", supplier: "Saltmarsh Sugar Company", status: "sent", lines: [["Sugar (sucrose)", "500"]], batchId: null });
};
