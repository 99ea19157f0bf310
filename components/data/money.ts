import { formatMoney } from "@/lib/format";

export const UNIT_LABELS = { per_kg: "per kg", per_pack: "per pack", per_tonne: "per tonne" } as const;

/** "GBP 28.50 per pack of 25 kg" — a quote as its supplier wrote it. */
export function quotedPrice(q: { price: string; currency: string; unit: keyof typeof UNIT_LABELS; packKg: string | null }): string {
  const pack = q.unit === "per_pack" && q.packKg ? ` of ${q.packKg} kg` : "";
  return `${formatMoney(q.price, q.currency, decimals(q.price))} ${UNIT_LABELS[q.unit]}${pack}`;
}

/** Per-kg prices keep up to 4 decimals when they need them (sugar at 0.985 / kg), at least 2. */
export function perKg(value: string | null, currency: string): string {
  return value === null ? "—" : `${formatMoney(value, currency, decimals(value))} / kg`;
}

function decimals(v: string): number {
  const frac = v.split(".")[1] ?? "";
  return Math.min(4, Math.max(2, frac.replace(/0+$/, "").length));
}
