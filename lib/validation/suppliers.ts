import { z } from "zod";
import { currencySchema, optionalText } from "./decimal";

const idSchema = z.string().uuid("Unknown item.");

const supplierFields = z
  .object({
    name: z.string().trim().min(1, "Name the supplier.").max(120, "Keep the name to 120 characters."),
    contactName: optionalText(120, "the contact's name"),
    email: z.preprocess(
      (v) => (typeof v === "string" && v.trim() === "" ? null : v),
      z.string().trim().toLowerCase().max(254, "That e-mail address is too long.").email("Enter a valid e-mail address, like orders@example.com.").nullable().optional(),
    ),
    currency: currencySchema,
    leadTimeDays: z.preprocess(
      (v) => (v === "" || v === undefined || v === null ? null : typeof v === "string" ? Number(v.trim()) : v),
      z
        .number("Enter the lead time as whole days, like 14.")
        .int("Enter the lead time as whole days, like 14.")
        .min(0, "The lead time cannot be negative.")
        .max(365, "Enter a lead time of at most 365 days.")
        .nullable(),
    ),
    notes: optionalText(2000, "the notes"),
  })
  .strict();

export const supplierSchema = supplierFields;
export type SupplierInput = z.infer<typeof supplierSchema>;

export const updateSupplierSchema = supplierFields.extend({ supplierId: idSchema }).strict();
export const supplierIdSchema = z.object({ supplierId: idSchema }).strict();
