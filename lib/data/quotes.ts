import "server-only";
import { and, asc, desc, eq, type SQL } from "drizzle-orm";
import { alias } from "drizzle-orm/pg-core";
import { db } from "@/db/client";
import { ingredients, priceQuotes, suppliers, users, type PriceUnit } from "@/db/schema";
import { conflict, invalid, notFound } from "@/lib/errors";
import { currentQuote, quotePerKgInBase, type DatedRate } from "@/lib/pricing/convert";
import { quoteDedupeKey } from "@/lib/pricing/dedupe-key";
import type { QuoteInput } from "@/lib/validation/quotes";
import { getBaseCurrency, listExchangeRates } from "./exchange-rates";
import { plain } from "./numeric";
import { isUniqueViolation } from "./pg-errors";

export type QuoteRecord = {
  id: string;
  supplierId: string;
  supplierName: string;
  ingredientId: string;
  ingredientName: string;
  price: string;
  currency: string;
  unit: PriceUnit;
  packKg: string | null;
  minimumOrderKg: string | null;
  validFrom: string;
  validUntil: string | null;
  source: string;
  createdAt: string;
  createdByName: string | null;
  /** Price per kg in the quote's own currency. */
  perKgQuoted: string | null;
  /** Price per kg in the base currency, at the rate of its valid-from day; null with `conversionProblem`. */
  perKgBase: string | null;
  conversionProblem: string | null;
  /** Whether this is the current quote of its supplier for its ingredient on the day asked about. */
  current: boolean;
};

/** A quote's id with its supplier and ingredient by id and name (join `suppliers` and `ingredients` on the quote). */
export const quotePairColumns = {
  id: priceQuotes.id,
  supplierId: priceQuotes.supplierId,
  supplierName: suppliers.name,
  ingredientId: priceQuotes.ingredientId,
  ingredientName: ingredients.name,
};

const creator = alias(users, "creator");

/**
 * Quotes of the workspace (all of them: history is kept), newest first,
 * optionally for one ingredient or one supplier, each with its price per kg in
 * the base currency and whether it is current on day `on`.
 */
export async function listQuotes({
  workspaceId,
  ingredientId,
  supplierId,
  on,
}: {
  workspaceId: string;
  ingredientId?: string;
  supplierId?: string;
  on: string;
}): Promise<{ baseCurrency: string; quotes: QuoteRecord[] }> {
  const filters: SQL[] = [eq(priceQuotes.workspaceId, workspaceId)];
  if (ingredientId) filters.push(eq(priceQuotes.ingredientId, ingredientId));
  if (supplierId) filters.push(eq(priceQuotes.supplierId, supplierId));
  const [rows, baseCurrency, rates] = await Promise.all([
    db
      .select({
        ...quotePairColumns,
        price: priceQuotes.price,
        currency: priceQuotes.currency,
        unit: priceQuotes.unit,
        packKg: priceQuotes.packKg,
        minimumOrderKg: priceQuotes.minimumOrderKg,
        validFrom: priceQuotes.validFrom,
        validUntil: priceQuotes.validUntil,
        source: priceQuotes.source,
        createdAt: priceQuotes.createdAt,
        createdByName: creator.name,
      })
      .from(priceQuotes)
      .innerJoin(suppliers, eq(suppliers.id, priceQuotes.supplierId))
      .innerJoin(ingredients, eq(ingredients.id, priceQuotes.ingredientId))
      .leftJoin(creator, eq(creator.id, priceQuotes.createdById))
      .where(and(...filters))
      .orderBy(desc(priceQuotes.validFrom), desc(priceQuotes.createdAt), asc(ingredients.name)),
    getBaseCurrency({ workspaceId }),
    listExchangeRates({ workspaceId }),
  ]);
  const currentIds = currentIdsByPair(rows, on);
  const quotes = rows.map((raw) => {
    const r = { ...raw, price: plain(raw.price), packKg: plain(raw.packKg), minimumOrderKg: plain(raw.minimumOrderKg) };
    const converted = quotePerKgInBase(r, { base: baseCurrency, rates, on: r.validFrom });
    return {
      ...r,
      createdAt: r.createdAt.toISOString(),
      perKgQuoted: converted.ok ? converted.value.perKgQuoted : null,
      perKgBase: converted.ok ? converted.value.perKg : null,
      conversionProblem: converted.ok ? null : converted.reason,
      current: currentIds.has(r.id),
    };
  });
  return { baseCurrency, quotes };
}

/** The ids of the current quote of every supplier × ingredient pair on day `on`. */
function currentIdsByPair<Q extends { id: string; supplierId: string; ingredientId: string; validFrom: string; validUntil: string | null; createdAt: Date }>(
  rows: readonly Q[],
  on: string,
): Set<string> {
  const groups = new Map<string, Q[]>();
  for (const r of rows) {
    const key = `${r.supplierId}:${r.ingredientId}`;
    groups.set(key, [...(groups.get(key) ?? []), r]);
  }
  const ids = new Set<string>();
  for (const group of groups.values()) {
    const q = currentQuote(group, on);
    if (q) ids.add(q.id);
  }
  return ids;
}

/** Checks that a supplier and an ingredient are the workspace's own and in use. */
async function checkPair(workspaceId: string, supplierId: string, ingredientId: string) {
  const [supplier] = await db
    .select({ archivedAt: suppliers.archivedAt, name: suppliers.name })
    .from(suppliers)
    .where(and(eq(suppliers.workspaceId, workspaceId), eq(suppliers.id, supplierId)));
  if (!supplier) throw notFound("That supplier");
  if (supplier.archivedAt) throw invalid(`${supplier.name} is archived; restore it first.`, { supplierId: ["That supplier is archived."] });
  const [ingredient] = await db
    .select({ archivedAt: ingredients.archivedAt, name: ingredients.name })
    .from(ingredients)
    .where(and(eq(ingredients.workspaceId, workspaceId), eq(ingredients.id, ingredientId)));
  if (!ingredient) throw notFound("That ingredient");
  if (ingredient.archivedAt) {
    throw invalid(`${ingredient.name} is archived; restore it first.`, { ingredientId: ["That ingredient is archived."] });
  }
}

/** Records a quote typed in by hand. The same quote twice is refused (dedupe key). */
export async function createQuote({
  workspaceId,
  userId,
  input,
}: {
  workspaceId: string;
  userId: string;
  input: QuoteInput;
}): Promise<{ id: string }> {
  await checkPair(workspaceId, input.supplierId, input.ingredientId);
  const packKg = input.unit === "per_pack" ? input.packKg : null;
  const values = { ...input, packKg, workspaceId, createdById: userId, source: "manual" };
  try {
    const [row] = await db
      .insert(priceQuotes)
      .values({ ...values, dedupeKey: quoteDedupeKey(values) })
      .returning({ id: priceQuotes.id });
    return { id: row!.id };
  } catch (err) {
    if (isUniqueViolation(err, "price_quotes_workspace_dedupe")) {
      throw conflict("This exact quote is already recorded (same supplier, ingredient, price, unit and dates).");
    }
    throw err;
  }
}

export type { DatedRate };
