import Decimal from "decimal.js";
import { COMPOSITION_FIELDS, type CompositionKey } from "@/lib/ingredients/kinds";

/** The sum of the composition fields and the "other" remainder, or null while a field is not a number. */
export function compositionTotal(values: { [K in CompositionKey]?: string | null }): { total: string; other: string; over: boolean } | null {
  let total = new Decimal(0);
  for (const f of COMPOSITION_FIELDS) {
    const v = (values[f.key] ?? "").trim();
    if (v === "") continue;
    if (!/^\d+(\.\d+)?$/.test(v)) return null;
    total = total.plus(v);
  }
  return { total: total.toFixed(), other: Decimal.max(0, new Decimal(100).minus(total)).toFixed(), over: total.gt(100) };
}
