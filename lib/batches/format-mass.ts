/**
 * Masses on a batch sheet: grams below a kilogram, kilograms above, always with
 * as many decimals as the scale's step shows (a 1 g scale reads 7.680 kg, a
 * 100 g scale 312.4 kg), so a figure is never shown finer or coarser than it
 * can be weighed. Display only; the stored grams stay exact.
 */
import Decimal from "decimal.js";

function group(fixed: string): string {
  const [int, frac] = fixed.split(".");
  const grouped = int!.replace(/\B(?=(\d{3})+(?!\d))/g, ",");
  return frac === undefined ? grouped : `${grouped}.${frac}`;
}

export function formatGrams(grams: string, resolutionGrams: string): string {
  const g = new Decimal(grams);
  const step = new Decimal(resolutionGrams);
  if (g.abs().lt(1000)) return `${group(g.toFixed(step.decimalPlaces()))} g`;
  return `${group(g.div(1000).toFixed(step.div(1000).decimalPlaces()))} kg`;
}

/** Kilograms from grams, exact, as a plain decimal string. */
export const gramsToKg = (grams: string) => new Decimal(grams).div(1000).toFixed();
