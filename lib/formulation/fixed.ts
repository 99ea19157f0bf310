import type { Decimal } from "decimal.js";

/**
 * Exact fixed-point helpers: a value at `scale` is held as an integer count of 10^-scale units
 * (a bigint), so that sums and largest-remainder splits are exact at any size.
 */

/** Number of decimal places needed to hold every value exactly. */
export function commonScale(values: readonly (Decimal | undefined)[]): number {
  let scale = 0;
  for (const value of values) if (value !== undefined) scale = Math.max(scale, value.decimalPlaces());
  return scale;
}

/** `value` × 10^scale as a bigint; `value` must have at most `scale` decimal places. */
export function toUnits(value: Decimal, scale: number): bigint {
  return BigInt(value.toFixed(scale).replace(".", ""));
}

/** A count of 10^-scale units as a plain decimal string without trailing zeros ("12.5", "0"). */
export function formatUnits(units: bigint, scale: number): string {
  const negative = units < 0n;
  const digits = (negative ? -units : units).toString().padStart(scale + 1, "0");
  const whole = digits.slice(0, digits.length - scale);
  const fraction = digits.slice(digits.length - scale).replace(/0+$/, "");
  const text = fraction === "" ? whole : `${whole}.${fraction}`;
  return negative && text !== "0" ? `-${text}` : text;
}

/** 10^scale as a bigint. */
export function powerOfTen(scale: number): bigint {
  return 10n ** BigInt(scale);
}

/** a / b rounded half up, for a ≥ 0 and b > 0. */
export function divRoundHalfUp(a: bigint, b: bigint): bigint {
  return (2n * a + b) / (2n * b);
}
