import { z } from "zod";
import { attachmentKinds } from "@/db/schema/attachments";
import { columnMappingSchema, DATE_FORMATS } from "@/lib/price-lists/fields";
import { isoDaySchema } from "./decimal";

const fileSchema = z.instanceof(File, { message: "Choose a file to upload." });

export const attachmentUploadSchema = z
  .object({
    file: fileSchema,
    kind: z.enum(attachmentKinds, "Choose spec sheet, certificate, lab report or other.").optional().default("spec_sheet"),
  })
  .strict();

/** A bean lot's file: a certificate (origin, organic…), a lab report or other; no spec sheets. */
export const lotFileUploadSchema = z
  .object({
    file: fileSchema,
    kind: z.enum(["certificate", "lab_report", "other"], "Choose certificate, lab report or other.").optional().default("certificate"),
  })
  .strict();

/** The confirmed column mapping arrives as one JSON form field; empty = guess from the header row. */
const mappingField = z.preprocess(
  (v, ctx) => {
    if (v === undefined || v === "") return null;
    try {
      return JSON.parse(String(v));
    } catch {
      ctx.addIssue({ code: "custom", message: "The column mapping is not readable." });
      return z.NEVER;
    }
  },
  columnMappingSchema.nullable(),
);

export const priceListUploadSchema = z
  .object({
    supplierId: z.string().uuid("Choose the supplier whose price list this is."),
    file: fileSchema,
    mapping: mappingField.optional().transform((m) => m ?? null),
    decimalSeparator: z.enum([".", ","], "Choose a decimal point or a decimal comma.").optional().default("."),
    dateFormat: z.enum(DATE_FORMATS, "Choose how the file writes dates.").optional().default("YYYY-MM-DD"),
    defaultValidFrom: z.preprocess((v) => (v === "" || v === undefined ? null : v), isoDaySchema.nullable()),
  })
  .strict();
export type PriceListUploadInput = z.infer<typeof priceListUploadSchema>;
