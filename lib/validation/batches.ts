import { z } from "zod";
import { batchMassUnits } from "@/db/schema/batches";
import { decimalOrNull, decimalText, isoDaySchema, optionalDecimalText, optionalText } from "./decimal";

const id = (message: string) => z.string().uuid(message);
const optionalId = (message: string) =>
  z.preprocess((v) => (v === "" || v === undefined || v === null ? null : v), z.string().uuid(message).nullable());

/** The most a batch may weigh: 1,000 t (far beyond a small maker; catches unit slips). */
export const MAX_BATCH_KG = "1000000";
const maxAmount: Record<(typeof batchMassUnits)[number], string> = { g: "1000000000", kg: MAX_BATCH_KG, t: "1000", bars: "10000000" };

const hours = (label: string) => optionalDecimalText({ label, max: "240", decimals: 1 });

/** Planning a batch: what to make, how much, on which machine and scale. */
const sizeFields = {
  recipeId: id("Choose a released recipe."),
  amount: decimalText({ label: "the batch size", max: "1000000000", decimals: 3, positive: true }),
  unit: z.enum(batchMassUnits, "Choose g, kg, t or bars."),
  stationId: id("Choose the weighing station."),
  machineId: optionalId("Choose a machine, or one load."),
};

function sizeRules(v: { amount: string; unit: (typeof batchMassUnits)[number] }, ctx: z.RefinementCtx) {
  const amount = decimalOrNull(v.amount);
  if (amount === null || !Object.hasOwn(maxAmount, v.unit)) return; // the fields' own messages say what is wrong
  if (amount.gt(maxAmount[v.unit])) {
    ctx.addIssue({ code: "custom", path: ["amount"], message: `At most ${maxAmount[v.unit]} ${v.unit} in one batch (1,000 t).` });
  }
  if (v.unit === "bars" && !amount.isInteger()) {
    ctx.addIssue({ code: "custom", path: ["amount"], message: "A number of bars is a whole number." });
  }
}

export const planBatchSchema = z
  .object({
    ...sizeFields,
    plannedFor: isoDaySchema,
    roastPresetId: optionalId("Choose a roast preset, or none."),
    refiningHours: hours("the refining time"),
    conchingHours: hours("the conching time"),
    notes: optionalText(2000, "the notes"),
  })
  .strict()
  .superRefine(sizeRules);
export type PlanBatchInput = z.infer<typeof planBatchSchema>;

/** The live preview takes the same fields, from a query string. */
export const previewBatchSchema = z.object(sizeFields).strict().superRefine(sizeRules);
export type PreviewBatchInput = z.infer<typeof previewBatchSchema>;

export const batchIdSchema = z.object({ batchId: id("Unknown batch.") }).strict();

/**
 * A wall-clock time as typed in a datetime-local field ("2026-12-01T08:30").
 * Kept as the kitchen's own clock: stored with a zero offset and shown back unchanged.
 */
const wallClock = (label: string) =>
  z
    .string()
    .trim()
    .regex(/^\d{4}-\d{2}-\d{2}T\d{2}:\d{2}$/, `Enter ${label} as a date and time.`)
    .refine((v) => !Number.isNaN(new Date(`${v}:00Z`).getTime()) && new Date(`${v}:00Z`).toISOString().startsWith(v), `${label}: that time does not exist.`)
    .transform((v) => new Date(`${v}:00Z`));

const portionSchema = z
  .object({
    batchLineId: id("Unknown batch line."),
    actual: decimalText({ label: "the actual mass", max: "1000000000", decimals: 3 }),
    unit: z.enum(["g", "kg"], "Choose g or kg."),
    lotCode: optionalText(60, "the lot code"),
  })
  .strict();

/** Recording a completed run: when, the tolerance, and each weighed portion. */
export const recordRunSchema = z
  .object({
    batchId: id("Unknown batch."),
    startedAt: wallClock("the start"),
    endedAt: wallClock("the end"),
    tolerancePercent: decimalText({ label: "the tolerance", max: "50", decimals: 2 }),
    notes: optionalText(2000, "the notes"),
    portions: z.array(portionSchema).min(1, "Enter what was weighed.").max(500, "At most 500 weighed portions."),
  })
  .strict()
  .superRefine((v, ctx) => {
    if (v.endedAt < v.startedAt) ctx.addIssue({ code: "custom", path: ["endedAt"], message: "The end is before the start." });
  });
export type RecordRunInput = z.infer<typeof recordRunSchema>;

export const batchListQuerySchema = z
  .object({
    status: z.enum(["planned", "completed", "cancelled"], "Unknown status.").optional(),
    lotId: id("Unknown lot.").optional(),
  })
  .strict();
