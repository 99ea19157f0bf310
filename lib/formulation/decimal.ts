import Decimal from "decimal.js";

/**
 * The engine's own Decimal constructor (a clone, so nothing outside can change its settings):
 * 64 significant digits, half-even rounding. Sums and products of ordinary inputs are exact
 * at this precision; only divisions by a base mass can be non-terminating.
 */
export const Dec = Decimal.clone({
  precision: 64,
  rounding: Decimal.ROUND_HALF_EVEN,
  toExpNeg: -1000,
  toExpPos: 1000,
});
export type Dec = Decimal;

/**
 * A twin used only for quotients that are shown, never compared: dividing at 34 digits rounds
 * once, straight to the output precision. Pass/fail never divides (see standards.ts).
 */
export const DisplayDec = Decimal.clone({ precision: 34, rounding: Decimal.ROUND_HALF_EVEN, toExpNeg: -1000, toExpPos: 1000 });

/** a ÷ b correctly rounded to 34 significant digits (the output precision); b ≠ 0. */
export function displayQuotient(a: Decimal, b: Decimal): Decimal {
  return a.isZero() ? ZERO : new DisplayDec(a).div(b);
}

export const ZERO: Decimal = new Dec(0);
export const ONE: Decimal = new Dec(1);
export const HUNDRED: Decimal = new Dec(100);

/** Significant digits kept in output strings: those of IEEE 754 decimal128. */
export const OUTPUT_SIGNIFICANT_DIGITS = 34;

/**
 * A Decimal as a plain-notation string ("70", "12.5", "0.000001"): exact when the value
 * has at most 34 significant digits, otherwise rounded half-even to 34. Never "-0",
 * never exponent notation.
 */
export function toDecimalString(value: Decimal): string {
  if (value.isZero()) return "0";
  const short = value.sd() <= OUTPUT_SIGNIFICANT_DIGITS ? value : value.toSignificantDigits(OUTPUT_SIGNIFICANT_DIGITS);
  return short.toFixed();
}

/** Why an input could not be read as a decimal. */
export type ReadProblem = "missing" | "not-a-number" | "out-of-range";

/** The result of reading one decimal input. */
export type ReadResult = { ok: true; value: Decimal } | { ok: false; problem: ReadProblem };

const DECIMAL_TEXT = /^[+-]?(?:\d+\.?\d*|\.\d+)(?:[eE][+-]?\d{1,6})?$/;
const MAX_TEXT_LENGTH = 200;

/**
 * Reads a number or decimal string into a Decimal without ever throwing.
 * Accepts finite numbers and strings like "12", "-0.5", " 1e-3 "; rejects NaN, Infinity,
 * hex, empty strings and other types. `undefined` and `null` are "missing". Magnitudes of
 * 1e15 and above, or non-zero magnitudes below 1e-40, are "out-of-range" (no mass share or
 * price is that large or small; the bound keeps outputs short).
 */
export function readDecimal(input: unknown): ReadResult {
  if (input === undefined || input === null) return { ok: false, problem: "missing" };
  const cacheable = typeof input === "number" || (typeof input === "string" && input.length <= MAX_TEXT_LENGTH);
  if (cacheable) {
    const known = cache.get(input);
    if (known !== undefined) return known;
  }
  const result = Object.freeze(readUncached(input));
  if (cacheable) {
    if (cache.size >= CACHE_LIMIT) cache.clear();
    cache.set(input, result);
  }
  return result;
}

/**
 * Recently read inputs. Reading is a pure function and Decimals are never mutated, so sharing
 * results changes nothing but speed: a slider re-reads the same ingredient figures many times
 * a second. Bounded: cleared when full.
 */
const cache = new Map<unknown, ReadResult>();
const CACHE_LIMIT = 4096;

function readUncached(input: unknown): ReadResult {
  let value: Decimal;
  if (typeof input === "number") {
    if (!Number.isFinite(input)) return { ok: false, problem: "not-a-number" };
    value = new Dec(input);
  } else if (typeof input === "string") {
    const text = input.trim();
    if (text.length > MAX_TEXT_LENGTH || !DECIMAL_TEXT.test(text)) {
      return { ok: false, problem: "not-a-number" };
    }
    value = new Dec(text);
  } else {
    return { ok: false, problem: "not-a-number" };
  }
  if (value.isZero()) return { ok: true, value: ZERO };
  if (value.e >= 15 || value.e < -40) return { ok: false, problem: "out-of-range" };
  return { ok: true, value };
}

/** A short, safe description of any input for warning messages. */
export function describeInput(input: unknown): string {
  if (typeof input === "string") {
    return JSON.stringify(input.length > 40 ? `${input.slice(0, 40)}…` : input);
  }
  if (typeof input === "number") return String(input);
  if (input === null) return "null";
  return typeof input;
}
