/**
 * Display formatting at the edge (the engine and data layer keep full decimal
 * strings). Numbers are rounded half-up for display only.
 */
import Decimal from "decimal.js";

function fixed(value: string | number | null | undefined, places: number): string {
  if (value === null || value === undefined || value === "") return "—";
  try {
    return new Decimal(value).toDecimalPlaces(places, Decimal.ROUND_HALF_UP).toFixed(places);
  } catch {
    return "—";
  }
}

/** "1,234.5" style grouping for an already fixed string. */
function group(s: string): string {
  const [int, frac] = s.split(".");
  const neg = int!.startsWith("-");
  const digits = neg ? int!.slice(1) : int!;
  const grouped = digits.replace(/\B(?=(\d{3})+(?!\d))/g, ",");
  return `${neg ? "-" : ""}${grouped}${frac !== undefined ? `.${frac}` : ""}`;
}

export const formatKg = (v: string | number | null | undefined, places = 2) => (fixed(v, places) === "—" ? "—" : `${group(fixed(v, places))} kg`);
export const formatPercent = (v: string | number | null | undefined, places = 1) => (fixed(v, places) === "—" ? "—" : `${fixed(v, places)} %`);
export const formatMoney = (v: string | number | null | undefined, currency: string, places = 2) =>
  fixed(v, places) === "—" ? "—" : `${currency} ${group(fixed(v, places))}`;
export const formatNumber = (v: string | number | null | undefined, places = 1) => (fixed(v, places) === "—" ? "—" : group(fixed(v, places)));

const dateFormat = new Intl.DateTimeFormat("en-GB", { day: "numeric", month: "short", year: "numeric", timeZone: "UTC" });
/** "30 Nov 2026" from an ISO day or a Date. */
export const formatDate = (d: string | Date | null | undefined) => (d ? dateFormat.format(typeof d === "string" ? new Date(`${d.slice(0, 10)}T00:00:00Z`) : d) : "—");
