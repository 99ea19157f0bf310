import "server-only";
import { and, asc, count, desc, eq } from "drizzle-orm";
import { db } from "@/db/client";
import { exchangeRates, workspaces } from "@/db/schema";
import { conflict, invalid, notFound } from "@/lib/errors";
import type { DatedRate } from "@/lib/pricing/convert";
import type { ExchangeRateInput } from "@/lib/validation/currencies";
import { plain } from "./numeric";

export type ExchangeRateRecord = DatedRate & { id: string };

/** The workspace's base currency (ISO 4217 code). */
export async function getBaseCurrency({ workspaceId }: { workspaceId: string }): Promise<string> {
  const [row] = await db.select({ base: workspaces.baseCurrency }).from(workspaces).where(eq(workspaces.id, workspaceId));
  if (!row) throw notFound("That workspace");
  return row.base;
}

/** Every rate the buyer has entered, by currency then newest first. */
export async function listExchangeRates({ workspaceId }: { workspaceId: string }): Promise<ExchangeRateRecord[]> {
  const rows = await db
    .select({ id: exchangeRates.id, currency: exchangeRates.currency, rateToBase: exchangeRates.rateToBase, validOn: exchangeRates.validOn })
    .from(exchangeRates)
    .where(eq(exchangeRates.workspaceId, workspaceId))
    .orderBy(asc(exchangeRates.currency), desc(exchangeRates.validOn));
  return rows.map((r) => ({ ...r, rateToBase: plain(r.rateToBase) }));
}

/**
 * Records the rate of a currency from a day on. Entering a second rate for the
 * same currency and day corrects that day's rate (there is one rate per day).
 */
export async function saveExchangeRate({
  workspaceId,
  userId,
  input,
}: {
  workspaceId: string;
  userId: string;
  input: ExchangeRateInput;
}): Promise<{ id: string; replaced: boolean }> {
  const base = await getBaseCurrency({ workspaceId });
  if (input.currency === base) {
    throw invalid(`${base} is the base currency: its rate is always 1.`, { currency: [`Choose a currency other than ${base}.`] });
  }
  const [existing] = await db
    .select({ id: exchangeRates.id })
    .from(exchangeRates)
    .where(and(eq(exchangeRates.workspaceId, workspaceId), eq(exchangeRates.currency, input.currency), eq(exchangeRates.validOn, input.validOn)));
  const [row] = await db
    .insert(exchangeRates)
    .values({ workspaceId, createdById: userId, ...input })
    .onConflictDoUpdate({
      target: [exchangeRates.workspaceId, exchangeRates.currency, exchangeRates.validOn],
      set: { rateToBase: input.rateToBase, createdById: userId },
    })
    .returning({ id: exchangeRates.id });
  return { id: row!.id, replaced: existing !== undefined };
}

export async function deleteExchangeRate({ workspaceId, rateId }: { workspaceId: string; rateId: string }): Promise<void> {
  const done = await db
    .delete(exchangeRates)
    .where(and(eq(exchangeRates.workspaceId, workspaceId), eq(exchangeRates.id, rateId)))
    .returning({ id: exchangeRates.id });
  if (done.length === 0) throw notFound("That exchange rate");
}

/**
 * Changes the base currency. Rates are stored against the base, so they would
 * all become wrong: the change is refused while any rate exists.
 */
export async function setBaseCurrency({ workspaceId, baseCurrency }: { workspaceId: string; baseCurrency: string }): Promise<void> {
  const base = await getBaseCurrency({ workspaceId });
  if (base === baseCurrency) return;
  const [rates] = await db.select({ n: count() }).from(exchangeRates).where(eq(exchangeRates.workspaceId, workspaceId));
  const n = rates?.n ?? 0;
  if (n > 0) {
    throw conflict(
      `Your ${n} exchange rate${n === 1 ? " is" : "s are"} stated in ${base}. Delete ${n === 1 ? "it" : "them"} first, then change the base currency and enter rates against ${baseCurrency}.`,
    );
  }
  await db.update(workspaces).set({ baseCurrency }).where(eq(workspaces.id, workspaceId));
}
