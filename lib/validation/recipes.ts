import Decimal from "decimal.js";
import { z } from "zod";
import { chocolateTypes } from "@/db/schema/recipes";
import { decimalOrNull } from "./decimal";

/** A decimal typed or sent as a string or a number, kept as a plain string. */
const decimalText = (message: string) =>
  z
    .union([z.string(), z.number()], message)
    .transform((v) => String(v).trim())
    .pipe(z.string().regex(/^\d{1,7}(\.\d{1,4})?$/, message));

export const percentSchema = decimalText("Enter a percent like 64 or 64.5 (up to 4 decimals).").refine(
  (v) => decimalOrNull(v)?.lte(100) ?? true, // the format message already says what is wrong
  "A percent cannot be above 100.",
);

export const barMassSchema = decimalText("Enter the bar mass in grams, like 70.").refine(
  (v) => {
    const d = decimalOrNull(v);
    return d === null || (d.gt(0) && d.lte(10_000) && d.decimalPlaces() <= 2); // null: the format message already says what is wrong
  },
  "The bar mass must be above 0 g and at most 10,000 g, with at most 2 decimals.",
);

const optionalText = (max: number, label: string) =>
  z
    .string()
    .trim()
    .max(max, `${label} can be at most ${max} characters.`)
    .optional()
    .transform((v) => (v ? v : undefined));

const optionalPercent = z
  .union([z.literal(""), percentSchema])
  .optional()
  .transform((v) => (v ? v : undefined));

export const recipeIdSchema = z.string().uuid("Unknown recipe.");
export const versionNoSchema = z.coerce.number("Unknown version.").int("Unknown version.").min(1, "Unknown version.").max(1_000_000, "Unknown version.");
export const recipeNameSchema = z.string().trim().min(1, "Name the recipe.").max(120, "Use at most 120 characters.");
export const chocolateTypeSchema = z.enum(chocolateTypes, "Choose dark, milk, white or other.");

export const recipeLineSchema = z.object({ ingredientId: z.string().uuid("Unknown ingredient."), percent: percentSchema }).strict();

/** Lines of a version: 1–40 ingredients, each once, adding up to exactly 100 %. */
export const recipeLinesSchema = z
  .array(recipeLineSchema, "Add at least one ingredient.")
  .min(1, "Add at least one ingredient.")
  .max(40, "A recipe can have at most 40 lines.")
  .superRefine((lines, ctx) => {
    const seen = new Set<string>();
    for (const line of lines) {
      if (seen.has(line.ingredientId)) ctx.addIssue({ code: "custom", message: "Each ingredient can appear only once." });
      seen.add(line.ingredientId);
    }
    const percents = lines.map((l) => decimalOrNull(l.percent));
    if (percents.some((p) => p === null)) return; // each bad line has its own message
    const total = percents.reduce<Decimal>((sum, p) => sum.plus(p!), new Decimal(0));
    if (!total.eq(100)) ctx.addIssue({ code: "custom", message: `The lines add up to ${total.toFixed()} %; they must add up to exactly 100 %.` });
  });

export const saveVersionSchema = z
  .object({
    recipeId: recipeIdSchema,
    /** The version the draft started from; 0 when the recipe has none yet. */
    baseVersionNo: z.number("Unknown version.").int().min(0).max(1_000_000),
    note: optionalText(500, "The note"),
    barMassGrams: barMassSchema,
    lines: recipeLinesSchema,
  })
  .strict();
export type SaveVersionInput = z.infer<typeof saveVersionSchema>;

/** The body of POST /api/recipes/:recipeId/versions: a save without the recipe id (it is in the path). */
export const saveVersionBodySchema = saveVersionSchema.omit({ recipeId: true }).strict();
export type SaveVersionBody = z.infer<typeof saveVersionBodySchema>;

export const recipeStarts = ["scratch", "starting_point", "copy"] as const;

export const createRecipeSchema = z
  .object({
    name: recipeNameSchema,
    chocolateType: chocolateTypeSchema,
    targetCocoaPercent: optionalPercent,
    barMassGrams: barMassSchema,
    notes: optionalText(2000, "Notes"),
    start: z.enum(recipeStarts, "Choose how to start."),
    startingPointKey: z.string().max(60).optional(),
    copyFromRecipeId: z.union([z.literal(""), recipeIdSchema]).optional(),
  })
  .strict()
  .superRefine((v, ctx) => {
    if (v.start === "starting_point" && !v.startingPointKey) {
      ctx.addIssue({ code: "custom", path: ["startingPointKey"], message: "Choose a starting point." });
    }
    if (v.start === "copy" && !v.copyFromRecipeId) {
      ctx.addIssue({ code: "custom", path: ["copyFromRecipeId"], message: "Choose the recipe to copy." });
    }
  });
export type CreateRecipeInput = z.infer<typeof createRecipeSchema>;

export const recipeDetailsSchema = z
  .object({
    recipeId: recipeIdSchema,
    name: recipeNameSchema,
    chocolateType: chocolateTypeSchema,
    targetCocoaPercent: optionalPercent,
    notes: optionalText(2000, "Notes"),
  })
  .strict();

export const restoreVersionSchema = z
  .object({ recipeId: recipeIdSchema, versionNo: versionNoSchema, baseVersionNo: z.coerce.number().int().min(0) })
  .strict();

export const releaseVersionSchema = z
  .object({ recipeId: recipeIdSchema, versionNo: versionNoSchema, note: optionalText(500, "The note") })
  .strict();

export const forkVersionSchema = z.object({ recipeId: recipeIdSchema, versionNo: versionNoSchema, name: recipeNameSchema }).strict();

export const recipeSorts = ["name", "updated", "cocoa", "cost"] as const;
export type RecipeSort = (typeof recipeSorts)[number];
export const recipeStatuses = ["draft", "released"] as const;
export type RecipeStatus = (typeof recipeStatuses)[number];

/** GET /api/recipes query; the list page reads the same fields leniently. */
export const recipeListQuerySchema = z
  .object({
    q: z.string().trim().max(100, "Search with at most 100 characters.").optional(),
    type: z.enum(chocolateTypes, "Unknown chocolate type.").optional(),
    status: z.enum(recipeStatuses, "Status is draft or released.").optional(),
    sort: z.enum(recipeSorts, "Sort by name, updated, cocoa or cost.").default("updated"),
    dir: z.enum(["asc", "desc"], "Direction is asc or desc.").optional(),
    page: z.coerce.number("Page must be a number.").int().min(1, "Pages start at 1.").max(100_000).default(1),
    pageSize: z.coerce.number("Page size must be a number.").int().min(1).max(100, "At most 100 per page.").default(25),
  })
  .strict();
export type RecipeListQuery = z.infer<typeof recipeListQuerySchema>;

/** "latest", "released" or a version number. */
export const versionRefSchema = z.union([z.enum(["latest", "released"]), versionNoSchema]);

const compositionField = decimalText("Use a figure in g per 100 g, like 55 or 43.5.").refine((v) => decimalOrNull(v)?.lte(100) ?? true, "At most 100 g per 100 g.");

const inlineIngredientSchema = z
  .object({
    name: z.string().trim().min(1, "Name the ingredient.").max(120),
    cocoaButter: compositionField.optional(),
    cocoaSolidsNonFat: compositionField.optional(),
    milkFat: compositionField.optional(),
    milkSolidsNonFat: compositionField.optional(),
    sugar: compositionField.optional(),
    vegetableFat: compositionField.optional(),
    moisture: compositionField.optional(),
    inclusion: z.boolean().optional(),
    pricePerKg: decimalText("Use a price like 12.50.").optional(),
  })
  .strict();

/** POST /api/recipes/evaluate: lines naming a library ingredient or carrying their own profile. */
export const evaluateRequestSchema = z
  .object({
    lines: z
      .array(
        z.union(
          [
            z.object({ ingredientId: z.string().uuid("Unknown ingredient."), percent: percentSchema }).strict(),
            z.object({ ingredient: inlineIngredientSchema, percent: percentSchema }).strict(),
          ],
          "Each line needs a percent and either an ingredientId or an ingredient.",
        ),
      )
      .min(1, "Send at least one line.")
      .max(60, "At most 60 lines."),
    authorities: z.array(z.enum(["EU", "US", "Codex"], "Authorities are EU, US or Codex.")).max(3).optional(),
    barMassGrams: barMassSchema.optional(),
    /** "summary" (the default): each category's pass and its failed checks; "full": every check with its wording. */
    standards: z.enum(["summary", "full"], 'Standards are "summary" or "full".').optional(),
  })
  .strict();
export type EvaluateRequest = z.infer<typeof evaluateRequestSchema>;
