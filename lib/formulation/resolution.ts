import type { Decimal } from "decimal.js";
import { Dec, HUNDRED, describeInput, readDecimal } from "./decimal";

/** Default step of percent sliders: 0.1 % (our choice for the bench). */
export const DEFAULT_PERCENT_RESOLUTION = "0.1";

/**
 * Reads a percent resolution: it must be positive and divide 100 exactly (0.1, 0.5, 0.01,
 * 1…), otherwise no grid sums to 100. A bad value falls back to 0.1 % with a note in `notes`.
 */
export function readPercentResolution(input: unknown, notes: string[]): Decimal {
  const fallback = new Dec(DEFAULT_PERCENT_RESOLUTION);
  const read = readDecimal(input);
  if (!read.ok) {
    if (read.problem !== "missing") notes.push(`Resolution ${describeInput(input)} is not a number; 0.1 % is used.`);
    return fallback;
  }
  if (!read.value.gt(0) || !HUNDRED.mod(read.value).isZero()) {
    notes.push(`Resolution ${describeInput(input)} must be positive and divide 100 exactly; 0.1 % is used.`);
    return fallback;
  }
  return read.value;
}
