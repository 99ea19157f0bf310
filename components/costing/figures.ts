/** Display helpers of the costing pages (rounding for display only; figures stay decimal strings). */
import { formatMoney, formatPercent } from "@/lib/format";
import type { MoneyResult } from "@/lib/formulation";

/** A price or cost to the cent: "EUR 12.50". */
export const cents = (value: string | null | undefined, currency: string) => formatMoney(value, currency, 2);

/** A cost per bar to a tenth of a cent, as the bench shows it: "EUR 0.885". */
export const perBar = (value: string | null | undefined, currency: string) => formatMoney(value, currency, 3);

/** A money result of the engine: the amount, or its reason. */
export function moneyOrReason(result: MoneyResult | null, currency: string, empty: string): string {
  if (!result) return empty;
  return result.ok ? cents(result.value, currency) : result.reason;
}

/** A margin result: "43.4 %", or its reason. */
export function marginOrReason(result: MoneyResult | null, empty: string): string {
  if (!result) return empty;
  return result.ok ? formatPercent(result.value, 1) : result.reason;
}
