/**
 * Warnings for lines the scale's step distorts: a line that rounds to nothing,
 * or whose weighed mass is off its exact share of the batch by more than 1 %
 * (our threshold). The masses themselves come from the engine (scaleBatch);
 * this only compares them with the exact shares, for the planner to choose a
 * finer scale. Pure and exact (decimal.js).
 */
import Decimal from "decimal.js";

export const PRECISION_THRESHOLD_PERCENT = "1";

export function precisionWarnings(
  lines: ReadonlyArray<{ name: string; percent: string; massGrams: string }>,
  totalMassGrams: string,
  resolutionGrams: string,
): string[] {
  const sum = lines.reduce((s, l) => s.plus(l.percent), new Decimal(0));
  if (sum.lte(0)) return [];
  const warnings: string[] = [];
  for (const l of lines) {
    if (new Decimal(l.percent).lte(0)) continue;
    const exact = new Decimal(totalMassGrams).times(l.percent).div(sum);
    const weighed = new Decimal(l.massGrams);
    if (weighed.isZero()) {
      warnings.push(`${l.name} rounds to 0 g at a ${resolutionGrams} g step (exactly ${exact.toDecimalPlaces(1).toFixed()} g). Weigh it on a finer scale.`);
      continue;
    }
    const off = weighed.minus(exact).div(exact).times(100);
    if (off.abs().gt(PRECISION_THRESHOLD_PERCENT)) {
      const sign = off.gt(0) ? "+" : "−";
      warnings.push(
        `${l.name}: ${weighed.toFixed()} g instead of ${exact.toDecimalPlaces(1).toFixed()} g (${sign}${off.abs().toDecimalPlaces(1).toFixed(1)} %) at a ${resolutionGrams} g step. Choose a finer scale.`,
      );
    }
  }
  return warnings;
}
