/** Helpers for ingredient, supplier and price tests: rows made through our own data functions. */
import { randomBytes } from "node:crypto";
import { db } from "@/db/client";
import { exchangeRates } from "@/db/schema";
import { createIngredient } from "@/lib/data/ingredients";
import { createQuote } from "@/lib/data/quotes";
import { createSupplier } from "@/lib/data/suppliers";
import { ingredientSchema } from "@/lib/validation/ingredients";
import { quoteSchema } from "@/lib/validation/quotes";
import { base } from "./matrix";

export const tag = () => randomBytes(3).toString("hex");

export async function makeSupplier(workspaceId: string, over: { name?: string; currency?: string } = {}) {
  const name = over.name ?? `Supplier ${tag()}`;
  const { id } = await createSupplier({
    workspaceId,
    input: { name, currency: over.currency ?? "EUR", contactName: null, email: null, leadTimeDays: null, notes: null },
  });
  return { id, name };
}

export async function makeIngredient(workspaceId: string, over: Record<string, unknown> = {}) {
  const input = ingredientSchema.parse({ name: `Ingredient ${tag()}`, kind: "sugar", sugar: "99.9", ...over });
  const { id } = await createIngredient({ workspaceId, input });
  return { id, name: input.name };
}

export async function makeQuote(workspaceId: string, userId: string, fields: Record<string, unknown>) {
  const input = quoteSchema.parse({ currency: "EUR", unit: "per_kg", validFrom: "2026-01-01", ...fields });
  return createQuote({ workspaceId, userId, input });
}

export async function addRate(workspaceId: string, currency: string, rateToBase: string, validOn: string) {
  await db.insert(exchangeRates).values({ workspaceId, currency, rateToBase, validOn });
}

/** A same-origin multipart POST, as the app's own pages send. */
export function formRequest(path: string, fields: Record<string, string | Blob | File>): Request {
  const body = new FormData();
  for (const [k, v] of Object.entries(fields)) body.set(k, v);
  return new Request(`${base}${path}`, {
    method: "POST",
    headers: { origin: base, host: "127.0.0.1:3000", "sec-fetch-site": "same-origin" },
    body,
  });
}

/** A CSV file as a browser would upload it. */
export function csvFile(text: string | Uint8Array, name = "prices.csv"): File {
  return new File([typeof text === "string" ? text : new Uint8Array(text)], name, { type: "text/csv" });
}
