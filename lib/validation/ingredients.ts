import Decimal from "decimal.js";
import { z } from "zod";
import { ingredientKinds } from "@/db/schema/ingredients";
import { allergenCodes } from "@/lib/ingredients/allergens";
import { COMPOSITION_FIELDS, NUTRIENT_FIELDS } from "@/lib/ingredients/kinds";
import { checkboxSchema, decimalOrNull, decimalText, optionalDecimalText, optionalText } from "./decimal";

const idSchema = z.string().uuid("Unknown item.");

const grams = (label: string) => decimalText({ label, max: "100", decimals: 4 });
const optionalGrams = (label: string) => optionalDecimalText({ label, max: "100", decimals: 4 });

/** Allergens arrive as an array (JSON) or one comma-separated form field. */
const allergensSchema = z.preprocess(
  (v) => (typeof v === "string" ? v.split(",").map((s) => s.trim()).filter(Boolean) : (v ?? [])),
  z.array(z.enum(allergenCodes, "Choose allergens from the list.")).transform((list) => [...new Set(list)].sort()),
);

/** A composition field: an empty field means 0 g (the remainder is "other"). */
const compositionGrams = (label: string) => z.preprocess((v) => (v === undefined || v === "" ? "0" : v), grams(label));

const compositionShape = Object.fromEntries(COMPOSITION_FIELDS.map((f) => [f.key, compositionGrams(f.label.toLowerCase())])) as Record<
  (typeof COMPOSITION_FIELDS)[number]["key"],
  ReturnType<typeof compositionGrams>
>;

const nutrientShape = Object.fromEntries(NUTRIENT_FIELDS.map((f) => [f.key, optionalGrams(f.label.toLowerCase())])) as Record<
  (typeof NUTRIENT_FIELDS)[number]["key"],
  ReturnType<typeof optionalGrams>
>;

const ingredientFields = z
  .object({
    name: z.string().trim().min(1, "Name the ingredient.").max(120, "Keep the name to 120 characters."),
    kind: z.enum(ingredientKinds, "Choose a kind."),
    ...compositionShape,
    isInclusion: checkboxSchema.optional().default(false),
    ...nutrientShape,
    allergens: allergensSchema.optional().default([]),
    source: optionalText(500, "the source"),
    notes: optionalText(2000, "the notes"),
  })
  .strict();

/** Composition fields are g per 100 g: together they cannot exceed 100 g (the rest is "other"). */
function compositionFits(value: Record<string, unknown>, ctx: z.RefinementCtx) {
  // A field that is not a decimal has its own message; it adds nothing here.
  const sum = COMPOSITION_FIELDS.reduce((acc, f) => acc.plus(decimalOrNull(value[f.key]) ?? 0), new Decimal(0));
  if (sum.gt(100)) {
    ctx.addIssue({
      code: "custom",
      path: ["composition"],
      message: `The composition adds up to ${sum.toFixed()} g per 100 g; it can be at most 100 g (the rest is "other").`,
    });
  }
}

export const ingredientSchema = ingredientFields.superRefine(compositionFits);
export type IngredientInput = z.infer<typeof ingredientSchema>;

export const updateIngredientSchema = ingredientFields.extend({ ingredientId: idSchema }).strict().superRefine(compositionFits);
export type UpdateIngredientInput = z.infer<typeof updateIngredientSchema>;

export const ingredientIdSchema = z.object({ ingredientId: idSchema }).strict();

export const preferredSupplierSchema = z
  .object({
    ingredientId: idSchema,
    // "" clears the choice.
    supplierId: z.preprocess((v) => (v === "" || v === "none" ? null : v), idSchema.nullable()),
  })
  .strict();

export const ingredientListQuerySchema = z
  .object({ archived: z.enum(["include", "exclude", "only"]).optional().default("exclude") })
  .strict();
