import { z } from "zod";
import { recipeIdSchema, versionNoSchema } from "./recipes";
import { optionalDecimalText, optionalText } from "./decimal";

/** How many equal pieces a bar breaks into; empty = one block. */
const piecesSchema = z.preprocess(
  (v) => (v === undefined || v === null || (typeof v === "string" && v.trim() === "") ? null : typeof v === "string" ? v.trim() : v),
  z.coerce
    .number("Enter the number of pieces as a whole number, like 12.")
    .int("Enter the number of pieces as a whole number, like 12.")
    .min(2, "A bar in pieces has at least 2; leave it empty for one block.")
    .max(500, "At most 500 pieces.")
    .nullable(),
);

/** The label settings a maker fills in for a recipe (saved per recipe, kept across versions). */
export const labelSettingsSchema = z
  .object({
    recipeId: recipeIdSchema,
    mayContain: optionalText(300, "the “may contain” statement"),
    piecesPerBar: piecesSchema,
    euPortionGrams: optionalDecimalText({ label: "the portion in grams", max: "1000", decimals: 2, positive: true }),
  })
  .strict();
export type LabelSettingsInput = z.infer<typeof labelSettingsSchema>;

/** Which saved version a label shows: a number, or the released (else latest) one when omitted. */
export const labelVersionSchema = z.preprocess((v) => (v === "" ? undefined : v), versionNoSchema.optional());

/** GET /api/labels/:recipeId — the label as a file. */
export const labelDownloadSchema = z
  .object({
    version: labelVersionSchema,
    format: z.enum(["pdf", "png"], "Format: pdf or png.").default("pdf"),
    paper: z.enum(["a4", "letter"], "Paper: a4 or letter.").default("a4"),
  })
  .strict();
export type LabelDownloadInput = z.infer<typeof labelDownloadSchema>;
