/**
 * Whether a line's actual mass deviates from its plan. The tolerance is the
 * maker's own (a percent of the planned mass); a difference within one scale
 * step is never flagged, since the scale cannot show less. Pure and exact.
 */
import Decimal from "decimal.js";

export type Deviation = {
  /** actual − planned, grams (negative = short). */
  differenceGrams: string;
  /** (actual − planned) ÷ planned × 100, two decimals half up; null when nothing was planned. */
  differencePercent: string | null;
  flagged: boolean;
};

export function lineDeviation(input: { plannedGrams: string; actualGrams: string; tolerancePercent: string; resolutionGrams: string }): Deviation {
  const planned = new Decimal(input.plannedGrams);
  const difference = new Decimal(input.actualGrams).minus(planned);
  const allowed = Decimal.max(planned.times(input.tolerancePercent).div(100), input.resolutionGrams);
  return {
    differenceGrams: difference.isZero() ? "0" : difference.toFixed(),
    differencePercent: planned.isZero() ? null : difference.div(planned).times(100).toDecimalPlaces(2, Decimal.ROUND_HALF_UP).toFixed(2),
    flagged: difference.abs().gt(allowed),
  };
}

/** Sum of decimal strings, exact. */
export const sumGrams = (values: readonly string[]) => values.reduce((s, v) => s.plus(v), new Decimal(0)).toFixed();
