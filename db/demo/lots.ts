/**
 * Demo bean lots of Fenwick Lane Chocolate Works. Origins are real producing
 * countries; cooperatives, lot codes, masses and prices are invented demo data.
 */
import { and, eq } from "drizzle-orm";
import { beanLots, cutTests, exchangeRates, lotCosts, processingRecords, roastPresets, suppliers } from "../schema";
import type { DemoSeeder } from "./context";

const SUPPLIER = { name: "Greyfriars Bean Importers", currency: "EUR" };

const presets = [
  { name: "Whole bean, medium", temperatureC: "132", minutes: "20", notes: "Our everyday roast for fruity origins. Demo data." },
  { name: "Whole bean, gentle", temperatureC: "121", minutes: "30", notes: "For delicate lots. Demo data." },
];

type Rec = Omit<typeof processingRecords.$inferInsert, "workspaceId" | "lotId" | "submissionKey" | "performedById">;

const lots: Array<{
  lot: Omit<typeof beanLots.$inferInsert, "workspaceId" | "supplierId" | "createdById">;
  costs: { label: string; amount: string; currency: string }[];
  cut?: Omit<typeof cutTests.$inferInsert, "workspaceId" | "lotId" | "testedById">;
  records: Rec[];
}> = [
  {
    lot: {
      code: "EC-2026-07",
      originCountry: "Ecuador",
      originRegion: "Manabí",
      producer: "Orvalle Growers Cooperative (invented)",
      harvestYear: 2026,
      arrivedOn: "2026-09-14",
      massReceivedKg: "250",
      pricePaid: "2150",
      currency: "EUR",
      moisturePercent: "7.1",
      notes: "Demo data: invented lot.",
    },
    costs: [
      { label: "Freight", amount: "180", currency: "EUR" },
      { label: "Duty", amount: "45", currency: "EUR" },
    ],
    cut: { testedOn: "2026-09-15", sampleSize: 100, wellFermented: 78, partlyFermented: 15, slaty: 3, mouldy: 1, insectDamaged: 2, germinated: 1 },
    records: [
      { step: "sorting", performedOn: "2026-09-20", massInKg: "250", massOutKg: "243.5", rejectsKg: "6.5", cost: "30" },
      { step: "roasting", performedOn: "2026-09-21", massInKg: "120", massOutKg: "114.2", roastTemperatureC: "132", roastMinutes: "20", ovenLoadKg: "12", cost: "24" },
      { step: "roasting", performedOn: "2026-09-22", massInKg: "123.5", massOutKg: "117.4", roastTemperatureC: "132", roastMinutes: "20", ovenLoadKg: "12", cost: "24" },
      { step: "winnowing", performedOn: "2026-09-24", massInKg: "231.6", massOutKg: "195.3", shellKg: "31.9", dustKg: "4.4", cost: "40" },
    ],
  },
  {
    lot: {
      code: "MG-2026-03",
      originCountry: "Madagascar",
      originRegion: "Sambirano",
      producer: "Ankivy River Growers (invented)",
      harvestYear: 2026,
      arrivedOn: "2026-10-05",
      massReceivedKg: "120",
      pricePaid: "1560",
      currency: "USD",
      moisturePercent: "6.8",
      notes: "Demo data: invented lot. Roasted, not yet winnowed.",
    },
    costs: [{ label: "Freight", amount: "140", currency: "USD" }],
    records: [
      { step: "sorting", performedOn: "2026-10-08", massInKg: "120", massOutKg: "117.1", rejectsKg: "2.9" },
      { step: "roasting", performedOn: "2026-10-09", massInKg: "117.1", massOutKg: "111.5", roastTemperatureC: "121", roastMinutes: "30", ovenLoadKg: "12" },
    ],
  },
  {
    lot: {
      code: "GH-2026-11",
      originCountry: "Ghana",
      originRegion: "Ashanti",
      producer: "Kwabre Hills Farmers Group (invented)",
      harvestYear: 2026,
      arrivedOn: "2026-11-18",
      massReceivedKg: "300",
      pricePaid: "2280",
      currency: "EUR",
      moisturePercent: "7.4",
      notes: "Demo data: invented lot. Just arrived.",
    },
    costs: [{ label: "Freight", amount: "210", currency: "EUR" }],
    records: [],
  },
];

export const seedLots: DemoSeeder = async ({ tx, workspaceId, people }) => {
  await tx.insert(suppliers).values({ workspaceId, ...SUPPLIER }).onConflictDoNothing();
  const [supplier] = await tx
    .select({ id: suppliers.id })
    .from(suppliers)
    .where(and(eq(suppliers.workspaceId, workspaceId), eq(suppliers.name, SUPPLIER.name)));
  // The Madagascar lot was paid in USD: a demo rate on its arrival day (invented).
  await tx.insert(exchangeRates).values({ workspaceId, currency: "USD", rateToBase: "0.92", validOn: "2026-10-01" }).onConflictDoNothing();
  for (const p of presets) await tx.insert(roastPresets).values({ workspaceId, ...p }).onConflictDoNothing();
  const [medium] = await tx
    .select({ id: roastPresets.id })
    .from(roastPresets)
    .where(and(eq(roastPresets.workspaceId, workspaceId), eq(roastPresets.name, presets[0]!.name)));

  for (const entry of lots) {
    const inserted = await tx
      .insert(beanLots)
      .values({ ...entry.lot, workspaceId, supplierId: supplier?.id ?? null, createdById: people.buyer })
      .onConflictDoNothing()
      .returning({ id: beanLots.id });
    if (inserted.length === 0) continue; // already seeded
    const lotId = inserted[0]!.id;
    for (const c of entry.costs) await tx.insert(lotCosts).values({ workspaceId, lotId, ...c });
    if (entry.cut) await tx.insert(cutTests).values({ workspaceId, lotId, testedById: people.buyer, ...entry.cut });
    let n = 0;
    for (const r of entry.records) {
      await tx.insert(processingRecords).values({
        ...r,
        workspaceId,
        lotId,
        performedById: people.production,
        roastPresetId: r.step === "roasting" && r.roastTemperatureC === "132" ? (medium?.id ?? null) : null,
        submissionKey: `demo-${entry.lot.code}-${++n}`,
      });
    }
  }
};
