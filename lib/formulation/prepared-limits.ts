import type { Decimal } from "decimal.js";
import { Dec, toDecimalString } from "./decimal";
import { QUANTITY_LABELS, type StandardQuantity } from "./quantities";
import { STANDARD_CATEGORIES, type StandardCategory, type StandardLimit } from "./reference/standards";
import type { Basis } from "./types";

/** A limit made ready once, at module load: its basis, bound, label and cache slot. */
export interface PreparedLimit {
  readonly limit: StandardLimit;
  readonly basis: Basis;
  readonly kind: "minimum" | "maximum";
  /** The bound, or undefined when it is a Codex setting read per evaluation. */
  readonly bound?: Decimal;
  readonly boundText?: string;
  readonly label?: string;
  /** Index of (basis, bound) among all fixed limits, for caching bound × mass; -1 for settings. */
  readonly slot: number;
}

/** A category with its prepared limits. */
export interface PreparedCategory {
  readonly category: StandardCategory;
  readonly limits: readonly PreparedLimit[];
}

/** "dry milk solids < 12 %", "cocoa butter ≥ 20 %", "no vegetable fats other than cocoa butter". */
export function labelOf(quantity: StandardQuantity, kind: PreparedLimit["kind"], bound: string, exclusive?: boolean): string {
  const name = QUANTITY_LABELS[quantity];
  if (kind === "minimum") return `${name} ≥ ${bound} %`;
  if (bound === "0") return `no ${name}`;
  return `${name} ${exclusive ? "<" : "≤"} ${bound} %`;
}

const slots = new Map<string, number>();

function prepare(limit: StandardLimit, category: StandardCategory): PreparedLimit {
  const kind = limit.maximum !== undefined ? "maximum" : "minimum";
  const basis = limit.basis ?? category.basis;
  if (limit.codexSetting !== undefined) return { limit, basis, kind, slot: -1 };
  const boundText = toDecimalString(new Dec((kind === "maximum" ? limit.maximum : limit.minimum) ?? "0"));
  const key = `${basis} ${boundText}`;
  if (!slots.has(key)) slots.set(key, slots.size);
  return {
    limit,
    basis,
    kind,
    bound: new Dec(boundText),
    boundText,
    label: labelOf(limit.quantity, kind, boundText, limit.exclusiveMaximum),
    slot: slots.get(key) as number,
  };
}

/** STANDARD_CATEGORIES with every limit prepared. */
export const PREPARED_CATEGORIES: readonly PreparedCategory[] = STANDARD_CATEGORIES.map((category) => ({
  category,
  limits: category.limits.map((limit) => prepare(limit, category)),
}));

/** Number of distinct (basis, bound) pairs among fixed limits. */
export const SLOT_COUNT = slots.size;
