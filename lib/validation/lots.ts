import { z } from "zod";

const text = (max: number, label: string) => z.string().trim().max(max, `${label}: at most ${max} characters.`);
const optionalText = (max: number, label: string) =>
  text(max, label)
    .optional()
    .transform((v) => (v ? v : undefined));

/** A decimal typed in a form: "12", "12.5", "12,5" (comma accepted), within bounds. */
export function decimalField(label: string, opts: { min?: number; max?: number; gt?: number } = {}) {
  return z
    .union([z.string(), z.number()])
    .transform((v) => String(v).trim().replace(",", "."))
    .refine((v) => /^\d+(\.\d+)?$/.test(v), `${label}: enter a number, like 12.5.`)
    .refine((v) => opts.min === undefined || Number(v) >= opts.min, `${label}: at least ${opts.min}.`)
    .refine((v) => opts.gt === undefined || Number(v) > opts.gt, `${label}: more than ${opts.gt}.`)
    .refine((v) => opts.max === undefined || Number(v) <= opts.max, `${label}: at most ${opts.max}.`);
}

function optionalDecimal(label: string, opts: { min?: number; max?: number } = {}) {
  return z
    .union([z.literal(""), decimalField(label, opts)])
    .optional()
    .transform((v) => (v === "" || v === undefined ? undefined : v));
}

const isoDate = (label: string) =>
  z
    .string()
    .regex(/^\d{4}-\d{2}-\d{2}$/, `${label}: use a date like 2026-11-30.`)
    .refine((v) => {
      const d = new Date(`${v}T00:00:00Z`);
      return !Number.isNaN(d.getTime()) && d.toISOString().slice(0, 10) === v;
    }, `${label}: that date does not exist.`);

const currency = z
  .string()
  .trim()
  .toUpperCase()
  .regex(/^[A-Z]{3}$/, "Currency: a three-letter ISO 4217 code, like EUR.");

export const createLotSchema = z
  .object({
    code: text(40, "Lot code").min(1, "Give the lot a code."),
    supplierId: z.union([z.literal(""), z.string().uuid("Choose a supplier.")]).transform((v) => v || undefined).optional(),
    originCountry: text(80, "Country").min(2, "Enter the country of origin."),
    originRegion: optionalText(120, "Region"),
    producer: optionalText(160, "Farm or cooperative"),
    harvestYear: z
      .union([z.literal(""), z.coerce.number().int("Harvest year: a whole year.").min(1990, "Harvest year: 1990 or later.").max(2100)])
      .transform((v) => (v === "" ? undefined : v))
      .optional(),
    arrivedOn: isoDate("Arrival date"),
    massReceivedKg: decimalField("Mass received (kg)", { gt: 0, max: 1_000_000 }),
    pricePaid: decimalField("Price paid", { min: 0, max: 100_000_000 }),
    currency,
    moisturePercent: optionalDecimal("Moisture (%)", { min: 0, max: 100 }),
    freight: optionalDecimal("Freight", { min: 0, max: 100_000_000 }),
    duty: optionalDecimal("Duty", { min: 0, max: 100_000_000 }),
    notes: optionalText(2000, "Notes"),
  })
  .strict();
export type CreateLotInput = z.infer<typeof createLotSchema>;

export const lotCostSchema = z
  .object({
    lotId: z.string().uuid("Unknown lot."),
    label: text(80, "What the cost is for").min(1, "Say what the cost is for (freight, duty…)."),
    amount: decimalField("Amount", { min: 0, max: 100_000_000 }),
    currency,
  })
  .strict();

const count = (label: string) => z.coerce.number().int(`${label}: a whole number.`).min(0, `${label}: 0 or more.`).max(10_000);

export const cutTestSchema = z
  .object({
    lotId: z.string().uuid("Unknown lot."),
    testedOn: isoDate("Date"),
    sampleSize: z.coerce.number().int("Sample: a whole number of beans.").min(1, "Sample: at least 1 bean.").max(10_000),
    wellFermented: count("Well fermented"),
    partlyFermented: count("Partly fermented"),
    slaty: count("Slaty"),
    mouldy: count("Mouldy"),
    insectDamaged: count("Insect-damaged"),
    germinated: count("Germinated"),
    notes: optionalText(1000, "Notes"),
  })
  .strict()
  .refine(
    (t) => t.wellFermented + t.partlyFermented + t.slaty + t.mouldy + t.insectDamaged + t.germinated <= t.sampleSize,
    { message: "The counts add up to more beans than the sample.", path: ["sampleSize"] },
  );

export const processingRecordSchema = z
  .object({
    lotId: z.string().uuid("Unknown lot."),
    step: z.enum(["sorting", "roasting", "winnowing"], "Choose a step."),
    performedOn: isoDate("Date"),
    massInKg: decimalField("Mass in (kg)", { gt: 0, max: 1_000_000 }),
    massOutKg: decimalField("Mass out (kg)", { min: 0, max: 1_000_000 }),
    rejectsKg: optionalDecimal("Rejects (kg)", { min: 0, max: 1_000_000 }),
    shellKg: optionalDecimal("Shell (kg)", { min: 0, max: 1_000_000 }),
    dustKg: optionalDecimal("Dust and loss (kg)", { min: 0, max: 1_000_000 }),
    roastTemperatureC: optionalDecimal("Roast temperature (°C)", { min: 20, max: 300 }),
    roastMinutes: optionalDecimal("Roast time (min)", { min: 0, max: 600 }),
    ovenLoadKg: optionalDecimal("Oven load (kg)", { min: 0, max: 100_000 }),
    roastPresetId: z.union([z.literal(""), z.string().uuid()]).transform((v) => v || undefined).optional(),
    cost: optionalDecimal("Cost of the step", { min: 0, max: 100_000_000 }),
    notes: optionalText(1000, "Notes"),
    /** A key the form generates once, so a double submit records the step once. */
    submissionKey: z.string().regex(/^[A-Za-z0-9-]{8,64}$/, "Reload the page and try again."),
  })
  .strict()
  .superRefine((r, ctx) => {
    if (r.step === "roasting" && (!r.roastTemperatureC || !r.roastMinutes)) {
      ctx.addIssue({ code: "custom", path: ["roastTemperatureC"], message: "A roast needs its temperature and time." });
    }
  });
export type ProcessingRecordInput = z.infer<typeof processingRecordSchema>;

export const roastPresetSchema = z
  .object({
    name: text(80, "Name").min(1, "Name the preset."),
    temperatureC: decimalField("Temperature (°C)", { min: 20, max: 300 }),
    minutes: decimalField("Time (min)", { gt: 0, max: 600 }),
    notes: optionalText(1000, "Notes"),
  })
  .strict();

export const lotIdSchema = z.object({ lotId: z.string().uuid("Unknown lot.") }).strict();
