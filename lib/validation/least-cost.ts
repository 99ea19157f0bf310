import { z } from "zod";
import { QUANTITIES, STANDARD_CATEGORIES } from "@/lib/formulation";
import { percentSchema } from "./recipes";

const optionalPercent = percentSchema.optional();

const lineSchema = z
  .object({
    ingredientId: z.string().uuid("Unknown ingredient."),
    percent: percentSchema,
    min: optionalPercent,
    max: optionalPercent,
    locked: z.boolean().optional(),
  })
  .strict();

const limitSchema = z
  .object({
    quantity: z.enum(QUANTITIES as [string, ...string[]], "Choose a composition figure."),
    basis: z.enum(["product", "eu", "codex", "us"], "The basis is product, eu, codex or us.").optional(),
    value: optionalPercent,
    min: optionalPercent,
    max: optionalPercent,
  })
  .strict()
  .refine((l) => l.value !== undefined || l.min !== undefined || l.max !== undefined, "Give a target, a minimum or a maximum.");

const categorySchema = z
  .object({ authority: z.enum(["EU", "US", "Codex"], "Authorities are EU, US or Codex."), category: z.string().trim().min(1).max(80) })
  .strict()
  .refine((c) => STANDARD_CATEGORIES.some((s) => s.authority === c.authority && s.category === c.category), "That is not a standards category of this authority.");

/** POST /api/least-cost: library lines with bounds, limits, categories and the objective. */
export const leastCostRequestSchema = z
  .object({
    lines: z.array(lineSchema).min(1, "Add at least one line.").max(60, "At most 60 lines."),
    limits: z.array(limitSchema).max(12, "At most 12 limits.").optional(),
    categories: z.array(categorySchema).max(20).optional(),
    objective: z.enum(["cost", "closest"], "The objective is cost or closest.").optional(),
    maxCostPerKg: z.string().regex(/^\d{1,9}(\.\d{1,6})?$/, "Enter a cost per kg like 7.50.").optional(),
    resolution: z.enum(["0.01", "0.1", "0.5", "1"], "The step is 0.01, 0.1, 0.5 or 1 %.").optional(),
  })
  .strict();

export type LeastCostRequest = z.infer<typeof leastCostRequestSchema>;
