import { z } from "zod";
import { priceUnits } from "@/db/schema/prices";
import { currencySchema, decimalText, isoDaySchema, optionalDecimalText } from "./decimal";

const idSchema = z.string().uuid("Unknown item.");

/** Largest price we accept (numeric(16,4) holds up to 10^12). */
export const MAX_PRICE = "999999999999";

/** The fields of one quote, shared by the form, the API and the price-list import. */
export const quoteFields = {
  price: decimalText({ label: "the price", max: MAX_PRICE, decimals: 4, positive: true }),
  currency: currencySchema,
  unit: z.enum(priceUnits, "Choose per kg, per pack or per tonne."),
  packKg: optionalDecimalText({ label: "the pack size", max: "100000", decimals: 3, positive: true }),
  minimumOrderKg: optionalDecimalText({ label: "the minimum order", max: "10000000", decimals: 3 }),
  validFrom: isoDaySchema,
  validUntil: z.preprocess((v) => (v === "" || v === undefined ? null : v), isoDaySchema.nullable()),
};

type QuoteDates = { unit: string; packKg: string | null; validFrom: string; validUntil: string | null };

/** Cross-field rules: a pack price needs its pack size; a period cannot end before it starts. */
export function quoteRules(v: QuoteDates, ctx: z.RefinementCtx) {
  if (v.unit === "per_pack" && !v.packKg) {
    ctx.addIssue({ code: "custom", path: ["packKg"], message: "A per-pack price needs the pack size in kg." });
  }
  if (v.validUntil && v.validUntil < v.validFrom) {
    ctx.addIssue({ code: "custom", path: ["validUntil"], message: "“Valid until” must be on or after “valid from”." });
  }
}

export const quoteSchema = z
  .object({ supplierId: idSchema, ingredientId: idSchema, ...quoteFields })
  .strict()
  .superRefine(quoteRules);
export type QuoteInput = z.infer<typeof quoteSchema>;

export const quoteListQuerySchema = z
  .object({
    ingredientId: idSchema.optional(),
    supplierId: idSchema.optional(),
    on: isoDaySchema.optional(),
  })
  .strict();
