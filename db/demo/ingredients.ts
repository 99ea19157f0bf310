/**
 * Demo ingredient library, suppliers, quotes and exchange rates of Fenwick Lane
 * Chocolate Works. Profiles are the engine's reference profiles (with their
 * sources) plus a roasted hazelnut inclusion. Supplier names, contacts, prices
 * and rates are INVENTED demo data. Idempotent: rows are matched on names and
 * quotes on their dedupe key.
 */
import { and, eq, inArray } from "drizzle-orm";
import { referenceIngredientRows } from "../../lib/ingredients/reference-rows";
import { quoteDedupeKey } from "../../lib/pricing/dedupe-key";
import { exchangeRates, ingredients, priceQuotes, suppliers, type NewIngredient, type PriceUnit } from "../schema";
import type { DemoSeeder } from "./context";

const DEMO = "demo data (invented prices)";

const demoSuppliers = [
  { name: "Greyfriars Bean Importers", contactName: "Ines Varga", email: "orders@greyfriars.example", currency: "EUR", leadTimeDays: 42, notes: "Beans, nibs and liquor. Invented demo supplier." },
  { name: "Saltmarsh Sugar Company", contactName: "Owen Pell", email: "sales@saltmarsh-sugar.example", currency: "GBP", leadTimeDays: 10, notes: "Cane sugar. Invented demo supplier." },
  { name: "Holloway Dairy Powders", contactName: "Bettina Roux", email: "trade@holloway-dairy.example", currency: "EUR", leadTimeDays: 14, notes: "Milk powders. Invented demo supplier." },
  { name: "Bellweather Butters", contactName: "Callum Dray", email: "hello@bellweather.example", currency: "EUR", leadTimeDays: 21, notes: "Deodorised and natural cocoa butter. Invented demo supplier." },
  { name: "Tallis Fine Ingredients", contactName: "Nadia Osei", email: "orders@tallis-fine.example", currency: "GBP", leadTimeDays: 7, notes: "Lecithin, vanilla, nuts. Invented demo supplier." },
];

// An inclusion, for the dark bar with 15 % roasted hazelnuts. Figures from memory, verify before use.
const hazelnut: Omit<NewIngredient, "workspaceId"> = {
  name: "Roasted hazelnuts",
  kind: "inclusion",
  isInclusion: true,
  // Moisture ≈ 2.5 g; the nut's own fat is not cocoa butter, milk fat or an added vegetable fat: "other".
  moisture: "2.5",
  fat: "62.4",
  protein: "15",
  carbohydrate: "17.6",
  fibre: "9.4",
  sugars: "4.9",
  ash: "2.5",
  allergens: ["nuts"],
  source: "Dry-roasted hazelnut, values per 100 g from memory of USDA SR Legacy (verify). Demo data.",
};

// USD and GBP against the EUR base: invented demo rates.
const rates = [
  { currency: "USD", rateToBase: "0.938", validOn: "2026-01-05" },
  { currency: "USD", rateToBase: "0.931", validOn: "2026-06-01" },
  { currency: "USD", rateToBase: "0.92", validOn: "2026-10-01" },
  { currency: "GBP", rateToBase: "1.172", validOn: "2026-01-05" },
  { currency: "GBP", rateToBase: "1.158", validOn: "2026-06-01" },
  { currency: "GBP", rateToBase: "1.149", validOn: "2026-10-01" },
];

type Q = [supplier: string, price: string, currency: string, unit: PriceUnit, packKg: string | null, validFrom: string, validUntil: string | null];

// Invented demo quotes, oldest first per pair; the last of each is current on 2026-12-01.
const quotes: Record<string, Q[]> = {
  "Cocoa nibs (roasted)": [
    ["Greyfriars Bean Importers", "14.8", "EUR", "per_kg", null, "2026-02-01", "2026-05-31"],
    ["Greyfriars Bean Importers", "15.6", "EUR", "per_kg", null, "2026-06-01", null],
    ["Greyfriars Bean Importers", "16.2", "EUR", "per_kg", null, "2026-10-01", null],
  ],
  "Cocoa liquor (cocoa mass)": [
    ["Greyfriars Bean Importers", "342", "USD", "per_pack", "25", "2026-03-01", null],
    ["Greyfriars Bean Importers", "365", "USD", "per_pack", "25", "2026-09-01", null],
  ],
  "Cocoa powder, 10–12 % fat": [["Greyfriars Bean Importers", "7.4", "USD", "per_kg", null, "2026-04-01", null]],
  "Cocoa butter": [
    ["Bellweather Butters", "18.4", "EUR", "per_kg", null, "2026-01-15", null],
    ["Bellweather Butters", "21.1", "EUR", "per_kg", null, "2026-05-15", null],
    ["Bellweather Butters", "19.8", "EUR", "per_kg", null, "2026-10-15", null],
    ["Tallis Fine Ingredients", "17.9", "GBP", "per_kg", null, "2026-08-01", null],
  ],
  "Sugar (sucrose)": [
    ["Saltmarsh Sugar Company", "920", "GBP", "per_tonne", null, "2026-01-10", null],
    ["Saltmarsh Sugar Company", "960", "GBP", "per_tonne", null, "2026-06-10", null],
    ["Saltmarsh Sugar Company", "985", "GBP", "per_tonne", null, "2026-10-10", null],
    ["Tallis Fine Ingredients", "28.5", "GBP", "per_pack", "25", "2026-07-01", null],
  ],
  "Whole milk powder": [
    ["Holloway Dairy Powders", "98", "EUR", "per_pack", "25", "2026-02-01", null],
    ["Holloway Dairy Powders", "104", "EUR", "per_pack", "25", "2026-08-01", null],
  ],
  "Skim milk powder": [["Holloway Dairy Powders", "3.1", "EUR", "per_kg", null, "2026-02-01", null]],
  "Buttermilk powder": [["Holloway Dairy Powders", "3.6", "EUR", "per_kg", null, "2026-02-01", null]],
  "Soy lecithin": [["Tallis Fine Ingredients", "6.8", "GBP", "per_kg", null, "2026-03-01", null]],
  "Vanilla (ground pods)": [
    ["Tallis Fine Ingredients", "395", "GBP", "per_kg", null, "2026-03-01", null],
    ["Tallis Fine Ingredients", "420", "GBP", "per_kg", null, "2026-09-01", null],
  ],
  "Roasted hazelnuts": [["Tallis Fine Ingredients", "11.4", "GBP", "per_kg", null, "2026-05-01", null]],
};

export const seedIngredients: DemoSeeder = async ({ tx, workspaceId, people }) => {
  await tx
    .insert(suppliers)
    .values(demoSuppliers.map((s) => ({ workspaceId, ...s })))
    .onConflictDoNothing({ target: [suppliers.workspaceId, suppliers.name] });
  await tx
    .insert(ingredients)
    .values([...referenceIngredientRows(), hazelnut].map((r) => ({ workspaceId, ...r })))
    .onConflictDoNothing({ target: [ingredients.workspaceId, ingredients.name] });
  await tx
    .insert(exchangeRates)
    .values(rates.map((r) => ({ workspaceId, createdById: people.buyer, ...r })))
    .onConflictDoNothing({ target: [exchangeRates.workspaceId, exchangeRates.currency, exchangeRates.validOn] });

  const supplierIds = new Map(
    (await tx.select({ id: suppliers.id, name: suppliers.name }).from(suppliers).where(eq(suppliers.workspaceId, workspaceId))).map((s) => [s.name, s.id]),
  );
  const library = await tx
    .select({ id: ingredients.id, name: ingredients.name, preferred: ingredients.preferredSupplierId })
    .from(ingredients)
    .where(and(eq(ingredients.workspaceId, workspaceId), inArray(ingredients.name, Object.keys(quotes))));
  for (const ingredient of library) {
    const list = quotes[ingredient.name] ?? [];
    for (const [supplier, price, currency, unit, packKg, validFrom, validUntil] of list) {
      const supplierId = supplierIds.get(supplier)!;
      const q = { supplierId, ingredientId: ingredient.id, price, currency, unit, packKg, minimumOrderKg: null, validFrom, validUntil };
      await tx
        .insert(priceQuotes)
        .values({ workspaceId, ...q, source: DEMO, dedupeKey: quoteDedupeKey(q), createdById: people.buyer })
        .onConflictDoNothing({ target: [priceQuotes.workspaceId, priceQuotes.dedupeKey] });
    }
    // The first supplier listed is the one the demo buys from; a choice made since is kept.
    if (!ingredient.preferred && list[0]) {
      await tx.update(ingredients).set({ preferredSupplierId: supplierIds.get(list[0][0])! }).where(eq(ingredients.id, ingredient.id));
    }
  }
};
