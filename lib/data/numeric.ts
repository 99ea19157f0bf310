import Decimal from "decimal.js";

/** A numeric column's text as its plain value ("365.0000" → "365", "52.3100" → "52.31"); null stays null. */
export function plain<T extends string | null>(value: T): T {
  return (value === null ? null : new Decimal(value).toFixed()) as T;
}
