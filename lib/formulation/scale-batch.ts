import type { Decimal } from "decimal.js";
import { apportion } from "./apportion";
import { describeInput, readDecimal } from "./decimal";
import { commonScale, divRoundHalfUp, formatUnits, toUnits } from "./fixed";
import { parsePercents } from "./input";
import { splitIntoLoads } from "./split-loads";
import type { DecimalInput } from "./types";
import type { FormulationWarning } from "./warnings";

/** Batch size and scale. Masses in kilograms, resolution in grams. */
export interface ScaleOptions {
  totalMassKg: DecimalInput;
  /** The scale's step, in grams (e.g. 1, 5, 0.1). */
  resolutionGrams: DecimalInput;
  /** Largest load one machine takes, in kilograms; omit for a single load. */
  machineCapacityKg?: DecimalInput;
}

/** One machine load: its mass and each line's mass in it, grams, in input line order. */
export interface ScaledLoad {
  massGrams: string;
  lineMassesGrams: string[];
}

/** A scaled batch: every mass a decimal string of grams, a whole number of resolution steps. */
export type ScaleResult<T> =
  | {
      ok: true;
      /** The batch mass actually weighed: the request rounded to the resolution. */
      totalMassGrams: string;
      requestedMassGrams: string;
      lines: Array<T & { massGrams: string }>;
      /** One load when no capacity is given. */
      loads: ScaledLoad[];
      notes: string[];
    }
  | { ok: false; reason: string };

/** More loads than this is surely a unit mistake (e.g. capacity in grams). */
export const MAX_LOADS = 10_000;

function positive(input: unknown, name: string): Decimal | string {
  const read = readDecimal(input);
  if (!read.ok || !read.value.gt(0)) return `${name} ${describeInput(input)} must be a positive number.`;
  return read.value;
}

/**
 * Scales a recipe to a batch: each line's mass in grams, a whole number of `resolutionGrams`
 * steps, the masses summing exactly to the batch mass (itself rounded half up to the
 * resolution, with a note if it had to be), split in proportion to the percents by largest
 * remainder (ties to the earlier line). With `machineCapacityKg`, the batch is split into
 * n = ceil(batch ÷ capacity) loads (capacity taken down to whole steps) whose masses differ by
 * at most one step; each load's lines sum exactly to the load and each line's loads sum
 * exactly to its batch mass. Exact bigint arithmetic: works from grams to far beyond 100 t.
 * Returns `{ ok: false, reason }` for bad sizes, no mass, or more than 10 000 loads.
 */
export function scaleBatch<T extends { percent?: unknown }>(lines: readonly T[], options: ScaleOptions): ScaleResult<T> {
  const warnings: FormulationWarning[] = [];
  const percents = parsePercents(lines, warnings);
  const notes = warnings.map((w) => w.message);
  const total = positive(options?.totalMassKg, "The batch mass");
  if (typeof total === "string") return { ok: false, reason: total };
  const step = positive(options?.resolutionGrams, "The scale resolution");
  if (typeof step === "string") return { ok: false, reason: step };
  const hasCapacity = options.machineCapacityKg !== undefined && options.machineCapacityKg !== null;
  const capacity = hasCapacity ? positive(options.machineCapacityKg, "The machine capacity") : undefined;
  if (typeof capacity === "string") return { ok: false, reason: capacity };
  const grams = total.times(1000);
  const scale = commonScale([grams, step, capacity?.times(1000)]);
  const stepUnits = toUnits(step, scale);
  const requestedUnits = toUnits(grams, scale);
  const steps = divRoundHalfUp(requestedUnits, stepUnits);
  if (steps === 0n) return { ok: false, reason: "The batch is smaller than half a resolution step." };
  if (steps * stepUnits !== requestedUnits) {
    notes.push(`The batch mass was rounded to ${formatUnits(steps * stepUnits, scale)} g, a whole number of ${formatUnits(stepUnits, scale)} g steps.`);
  }
  const weightScale = commonScale(percents);
  const weights = percents.map((p) => toUnits(p, weightScale));
  if (weights.every((w) => w === 0n)) return { ok: false, reason: "No line has a percent above 0." };
  const masses = apportion(steps, weights);
  const capacitySteps = capacity === undefined ? steps : toUnits(capacity.times(1000), scale) / stepUnits;
  if (capacitySteps === 0n) return { ok: false, reason: "The machine capacity is below one resolution step." };
  const loadCount = (steps + capacitySteps - 1n) / capacitySteps;
  if (loadCount > BigInt(MAX_LOADS)) return { ok: false, reason: `That would take ${loadCount} loads; check the capacity's unit (kilograms).` };
  const grams$ = (n: bigint) => formatUnits(n * stepUnits, scale);
  const list: readonly T[] = Array.isArray(lines) ? lines : [];
  return {
    ok: true,
    totalMassGrams: grams$(steps),
    requestedMassGrams: formatUnits(requestedUnits, scale),
    lines: list.map((line, i) => ({ ...line, massGrams: grams$(masses[i] ?? 0n) })),
    loads: splitIntoLoads(masses, Number(loadCount)).map((load) => ({
      massGrams: grams$(load.reduce((a, b) => a + b, 0n)),
      lineMassesGrams: load.map(grams$),
    })),
    notes,
  };
}
