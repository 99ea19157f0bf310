import Decimal from "decimal.js";
import { formatPercent, roundMoney } from "@/lib/formulation";

/** "70.0 %" (display only); an em dash for a missing figure. */
export function pct(value: string | null | undefined, decimals = 1): string {
  if (value === null || value === undefined) return "—";
  return `${formatPercent(value, decimals) ?? "—"} %`;
}

/** "4.12 EUR" (display only, cents half up). */
export function money(value: string | null | undefined, currency: string, decimals = 2): string {
  if (value === null || value === undefined) return "—";
  return `${roundMoney(value, decimals) ?? "—"} ${currency}`;
}

/** "+1.2" / "−0.4" / "0.0" for a delta, with a true minus sign. */
export function signed(value: string | null, decimals = 1): string {
  if (value === null) return "—";
  const d = new Decimal(value).toDecimalPlaces(decimals, Decimal.ROUND_HALF_UP);
  if (d.isZero()) return (0).toFixed(decimals);
  return `${d.isNegative() ? "−" : "+"}${d.abs().toFixed(decimals)}`;
}

/** "v3" */
export const versionLabel = (n: number) => `v${n}`;

/** A slider number as the engine's decimal string at the resolution's decimals. */
export function percentText(value: number, decimals = 1): string {
  return value.toFixed(decimals);
}
