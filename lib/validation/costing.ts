import { z } from "zod";
import { checkboxSchema, decimalText, optionalDecimalText, optionalText } from "./decimal";
import { recipeIdSchema, versionNoSchema } from "./recipes";

/** An amount a buyer may leave empty for "none": empty → "0". */
const amount = (label: string, max: string) =>
  z.preprocess((v) => (v === undefined || v === null || (typeof v === "string" && v.trim() === "") ? "0" : v), decimalText({ label, max, decimals: 4 }));

/** A percent of the price or of the chocolate, below 100. */
const belowHundred = (label: string) =>
  decimalText({ label, max: "99.99", decimals: 2 });

const wholeNumber = (label: string, min: number, max: number) =>
  z.preprocess(
    (v) => (typeof v === "string" ? v.trim() : v),
    z.union([z.string(), z.number()]).refine((v) => /^\d+$/.test(String(v)) && Number(v) >= min && Number(v) <= max, `${label} must be a whole number from ${min} to ${max}.`).transform(Number),
  );

const optionalWholeNumber = (label: string, min: number, max: number) =>
  z.preprocess((v) => (v === undefined || v === null || (typeof v === "string" && v.trim() === "") ? null : v), wholeNumber(label, min, max).nullable());

/**
 * The cost model of a recipe as the buyer types it. Money in the base currency
 * (per bar or per kg of finished chocolate); `expectedRevision` is the revision
 * the form was filled from (0 when none), so two people cannot overwrite each
 * other unseen.
 */
export const costSettingsSchema = z
  .object({
    recipeId: recipeIdSchema,
    expectedRevision: wholeNumber("The revision", 0, 1_000_000),
    processLossPercent: z.preprocess((v) => (typeof v === "string" && v.trim() === "" ? "0" : v), belowHundred("the process loss")),
    packagingPerBar: amount("packaging per bar", "10000"),
    labourPerBar: amount("labour per bar", "10000"),
    labourPerKg: amount("labour per kg", "1000000"),
    overheadPerBar: amount("overhead per bar", "10000"),
    overheadPerKg: amount("overhead per kg", "1000000"),
    barsPerCase: wholeNumber("Bars per case", 1, 10_000),
    wholesaleMarginPercent: optionalDecimalText({ label: "the wholesale margin", max: "99.99", decimals: 2 }),
    retailMarginPercent: optionalDecimalText({ label: "the retail margin", max: "99.99", decimals: 2 }),
    wholesalePricePerBar: optionalDecimalText({ label: "the wholesale price", max: "100000", decimals: 4, positive: true }),
    retailPricePerBar: optionalDecimalText({ label: "the retail price", max: "100000", decimals: 4, positive: true }),
    batchKg: optionalDecimalText({ label: "the batch size", max: "1000000", decimals: 3, positive: true }),
    needWithinDays: optionalWholeNumber("Need within (days)", 0, 3650),
    note: optionalText(300, "the note"),
  })
  .strict();

export type CostSettingsInput = z.infer<typeof costSettingsSchema>;

/** "preferred" (forget the pick), or a source key: "supplier:<uuid>" or "lot:<uuid>". */
export const pickSourceSchema = z
  .string()
  .trim()
  .regex(/^(preferred|(supplier|lot):[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12})$/i, "Choose a supplier or a lot from the list.");

export const pickSupplierSchema = z
  .object({ recipeId: recipeIdSchema, ingredientId: z.string().uuid("Unknown ingredient."), source: pickSourceSchema })
  .strict();

export type PickSupplierInput = z.infer<typeof pickSupplierSchema>;

export const resetPicksSchema = z.object({ recipeId: recipeIdSchema }).strict();

export const costVisibilitySchema = z.object({ show: checkboxSchema }).strict();

/** The version a costing page or export is about; none = the latest. */
export const costingQuerySchema = z.object({ version: versionNoSchema.optional() }).strict();

/** "recipeId:versionNo" or "recipeId:latest", as the compare page's `v` parameters carry them. */
export const compareRefSchema = z
  .string()
  .regex(/^[0-9a-f-]{36}:(latest|\d{1,7})$/i)
  .transform((v) => {
    const [recipeId, ref] = v.split(":") as [string, string];
    return { recipeId, versionNo: ref === "latest" ? ("latest" as const) : Number(ref) };
  });
