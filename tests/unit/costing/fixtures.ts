/** Small builders for costing tests: invented suppliers, lots and prices (demo data, not market quotes). */
import { DEFAULT_COST_SETTINGS, type CostLine, type CostSettings, type PriceOption } from "@/lib/costing";

let n = 0;
/** A stable-looking uuid per call (the costing code only compares keys). */
export function id(): string {
  n += 1;
  return `00000000-0000-4000-8000-${String(n).padStart(12, "0")}`;
}

export function settings(over: Partial<CostSettings> = {}): CostSettings {
  return { ...DEFAULT_COST_SETTINGS, ...over };
}

/** A supplier option priced in the base currency already. */
export function eurOption(label: string, perKg: string, over: Partial<PriceOption> = {}): PriceOption {
  const sourceId = id();
  return {
    key: `supplier:${sourceId}`,
    kind: "supplier",
    sourceId,
    label,
    perKg,
    problem: null,
    quoted: { price: perKg, currency: "EUR", unit: "per_kg", packKg: null },
    validUntil: null,
    minimumOrderKg: null,
    leadTimeDays: null,
    estimated: false,
    ...over,
  };
}

/** A recipe line whose preferred source is the first option unless said otherwise. */
export function line(name: string, percent: string, options: PriceOption[], over: Partial<CostLine> = {}): CostLine {
  return {
    ingredientId: id(),
    name,
    kind: "other",
    percent,
    spec: { name },
    preferredSupplierName: options[0]?.label ?? null,
    preferredKey: options[0]?.key ?? null,
    pickKey: null,
    pickLabel: null,
    options,
    ...over,
  };
}
