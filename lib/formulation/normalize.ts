import { distribute } from "./distribute";
import { commonScale, formatUnits, powerOfTen, toUnits } from "./fixed";
import { parsePercents } from "./input";
import { readPercentResolution } from "./resolution";
import type { DecimalInput } from "./types";
import type { FormulationWarning } from "./warnings";

/** Percents brought to exactly 100, with any notes. */
export interface NormalizeResult {
  percents: string[];
  message?: string;
}

/**
 * Scales any list of percents (or parts) so they sum to exactly 100 on a grid of `resolution`
 * percent (default 0.1, must divide 100), in proportion to the inputs, by largest remainder
 * (ties to the earlier line); all zeros become equal shares. Bad values count as 0, with a note.
 * An empty list gives an empty list.
 */
export function normalizePercents(percents: readonly DecimalInput[], resolution?: DecimalInput): NormalizeResult {
  const warnings: FormulationWarning[] = [];
  const list = Array.isArray(percents) ? percents : [];
  const values = parsePercents(list.map((percent) => ({ percent })), warnings);
  const notes = warnings.map((w) => w.message);
  const step = readPercentResolution(resolution, notes);
  const scale = commonScale([...values, step]);
  const out = distribute({
    current: values.map((v) => toUnits(v, scale)),
    locked: values.map(() => false),
    whole: 100n * powerOfTen(scale),
    step: toUnits(step, scale),
    changed: -1,
    requested: 0n,
    low: 0n,
    high: 0n,
  });
  const result: NormalizeResult = { percents: out.values.map((v) => formatUnits(v, scale)) };
  if (notes.length > 0) result.message = notes.join(" ");
  return result;
}
