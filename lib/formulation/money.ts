import { Dec, HUNDRED, describeInput, readDecimal, toDecimalString } from "./decimal";

/** A computed amount, or a sentence saying why it cannot be computed. */
export type MoneyResult = { ok: true; value: string } | { ok: false; reason: string };

/**
 * Selling price giving `marginPercent` of gross margin on the price:
 * price = cost ÷ (1 − margin / 100). Margin must be below 100 %; cost ≥ 0.
 */
export function priceAtMargin(cost: number | string, marginPercent: number | string): MoneyResult {
  const c = readDecimal(cost);
  const m = readDecimal(marginPercent);
  if (!c.ok || c.value.isNegative()) return { ok: false, reason: `The cost ${describeInput(cost)} must be a number of at least 0.` };
  if (!m.ok || m.value.gte(HUNDRED)) return { ok: false, reason: `The margin ${describeInput(marginPercent)} must be a number below 100 %.` };
  return { ok: true, value: toDecimalString(c.value.times(HUNDRED).div(HUNDRED.minus(m.value))) };
}

/**
 * Gross margin on the price, percent: (price − cost) ÷ price × 100. Negative when selling
 * below cost. Price must be above 0.
 */
export function marginAtPrice(cost: number | string, price: number | string): MoneyResult {
  const c = readDecimal(cost);
  const p = readDecimal(price);
  if (!c.ok || c.value.isNegative()) return { ok: false, reason: `The cost ${describeInput(cost)} must be a number of at least 0.` };
  if (!p.ok || !p.value.gt(0)) return { ok: false, reason: `The price ${describeInput(price)} must be a number above 0.` };
  return { ok: true, value: toDecimalString(p.value.minus(c.value).times(HUNDRED).div(p.value)) };
}

function roundForDisplay(value: number | string, decimals: number): string | null {
  const read = readDecimal(value);
  if (!read.ok || !Number.isInteger(decimals) || decimals < 0 || decimals > 20) return null;
  const text = read.value.toFixed(decimals, Dec.ROUND_HALF_UP);
  return /^-0(\.0*)?$/.test(text) ? text.slice(1) : text;
}

/**
 * Display rounding of money: half up (away from zero on a tie) to `decimals` places (default
 * 2, cents), with trailing zeros kept ("12.30"). Only for display: the engine never feeds a
 * rounded figure back into a computation. Null for a value that is not a number.
 */
export function roundMoney(value: number | string, decimals = 2): string | null {
  return roundForDisplay(value, decimals);
}

/** Display rounding of a percentage, half up, default 1 place ("68.8"). Null when not a number. */
export function formatPercent(value: number | string, decimals = 1): string | null {
  return roundForDisplay(value, decimals);
}
