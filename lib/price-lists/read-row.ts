import { z } from "zod";
import { isRealIsoDay } from "@/lib/validation/decimal";
import { quoteFields, quoteRules } from "@/lib/validation/quotes";
import type { ColumnMapping, DateFormat, DecimalSeparator, PriceListField } from "./fields";
import { PRICE_LIST_FIELDS } from "./fields";

export type ReadOptions = {
  mapping: ColumnMapping;
  decimalSeparator: DecimalSeparator;
  dateFormat: DateFormat;
  /** Used when a row has no valid-from date (or no column is mapped). */
  defaultValidFrom: string | null;
  /** The supplier's currency, used when a row has none. */
  defaultCurrency: string;
};

export type IngredientRef = { id: string; name: string; archived: boolean };

export type ReadRow =
  | {
      ok: true;
      ingredient: IngredientRef;
      quote: { price: string; currency: string; unit: "per_kg" | "per_pack" | "per_tonne"; packKg: string | null; minimumOrderKg: string | null; validFrom: string; validUntil: string | null };
    }
  | { ok: false; reasons: string[]; ingredientName: string };

/**
 * A number as the list writes it → a plain decimal ("1.234,50" with a decimal
 * comma → "1234.50"); currency symbols and a trailing "kg" are dropped.
 * Thousands separators are removed only when they group digits by three, so
 * "12,50" with a decimal point chosen stays invalid instead of becoming 1250.
 */
export function normaliseNumber(raw: string, sep: DecimalSeparator): string {
  const t = raw.replace(/^[€£$\s]+|[€£$\s]+$/g, "").replace(/\s*kgs?$/i, "").replace(/[\s\u00a0']/g, "");
  const group = sep === "," ? "." : ",";
  const grouped = new RegExp(`^\\d{1,3}(\\${group}\\d{3})+(\\${sep}\\d+)?$`);
  const plain = grouped.test(t) ? t.split(group).join("") : t;
  return sep === "," ? plain.replace(",", ".") : plain;
}

const UNIT_WORDS: Record<string, "per_kg" | "per_pack" | "per_tonne"> = {
  kg: "per_kg", kgs: "per_kg", kilo: "per_kg", kilogram: "per_kg",
  t: "per_tonne", tonne: "per_tonne", ton: "per_tonne", mt: "per_tonne", "1000kg": "per_tonne",
  pack: "per_pack", bag: "per_pack", sack: "per_pack", case: "per_pack", box: "per_pack", carton: "per_pack", pail: "per_pack", drum: "per_pack",
};

/** "per kg", "/kg", "EUR/kg", "Bag" → our unit; "" → per kg; anything else → null. */
export function normaliseUnit(raw: string): "per_kg" | "per_pack" | "per_tonne" | null {
  if (raw.trim() === "") return "per_kg";
  const key = raw
    .toLowerCase()
    .replace(/[€£$\s/.]/g, "")
    .replace(/^(eur|gbp|usd)/, "")
    .replace(/^(price)?(per)?/, "")
    .replace(/^1(?=[a-z])/, "");
  return UNIT_WORDS[key] ?? null;
}

/** A date as the chosen format writes it → YYYY-MM-DD, or null when it does not fit the format or does not exist. */
export function normaliseDate(raw: string, format: DateFormat): string | null {
  const t = raw.trim();
  const m =
    format === "YYYY-MM-DD" ? /^(\d{4})-(\d{1,2})-(\d{1,2})$/.exec(t) : /^(\d{1,2})[/.-](\d{1,2})[/.-](\d{4})$/.exec(t);
  if (!m) return null;
  const [y, mo, d] =
    format === "YYYY-MM-DD" ? [m[1], m[2], m[3]] : format === "MM/DD/YYYY" ? [m[3], m[1], m[2]] : [m[3], m[2], m[1]];
  const iso = `${y}-${mo!.padStart(2, "0")}-${d!.padStart(2, "0")}`;
  return isRealIsoDay(iso) ? iso : null;
}

const rowSchema = z.object(quoteFields).superRefine(quoteRules);

const LABEL: Record<string, string> = Object.fromEntries(PRICE_LIST_FIELDS.map((f) => [f.key, f.label]));

/**
 * Reads one data row with the confirmed mapping: looks the ingredient up by
 * name (case and spacing ignored), normalises numbers, units and dates, and
 * validates the quote with the same zod rules as a quote typed by hand. Every
 * problem of the row is listed, each with the column it concerns.
 */
export function readPriceListRow(cells: readonly string[], opts: ReadOptions, lookup: (name: string) => IngredientRef | undefined): ReadRow {
  const cell = (f: PriceListField) => {
    const i = opts.mapping[f];
    return i === null ? "" : (cells[i] ?? "").trim();
  };
  const reasons: string[] = [];
  const ingredientName = cell("ingredient");
  const ingredient = ingredientName ? lookup(ingredientName) : undefined;
  if (!ingredientName) reasons.push("Ingredient: the cell is empty.");
  else if (!ingredient) reasons.push(`Ingredient: no ingredient called “${ingredientName}” in your library. Add it, or correct the name.`);
  else if (ingredient.archived) reasons.push(`Ingredient: ${ingredient.name} is archived. Restore it to record prices for it.`);

  const unit = normaliseUnit(cell("unit"));
  if (unit === null) reasons.push(`Unit: “${cell("unit")}” is not a unit we know. Write per kg, per pack or per tonne.`);

  const dates: Record<"validFrom" | "validUntil", string | null> = { validFrom: null, validUntil: null };
  for (const f of ["validFrom", "validUntil"] as const) {
    const raw = cell(f);
    if (raw === "") continue;
    dates[f] = normaliseDate(raw, opts.dateFormat);
    if (!dates[f]) reasons.push(`${LABEL[f]}: “${raw}” is not a date written as ${opts.dateFormat}.`);
  }
  const validFrom = dates.validFrom ?? (cell("validFrom") === "" ? opts.defaultValidFrom : null);
  if (cell("validFrom") === "" && !opts.defaultValidFrom) reasons.push("Valid from: no date. Map a date column or set one date for the whole list.");

  const number = (f: "price" | "packKg" | "minimumOrderKg") => (cell(f) === "" ? "" : normaliseNumber(cell(f), opts.decimalSeparator));
  const parsed = rowSchema.safeParse({
    price: number("price"),
    currency: cell("currency") || opts.defaultCurrency,
    unit: unit ?? "per_kg",
    packKg: number("packKg"),
    minimumOrderKg: number("minimumOrderKg"),
    validFrom: validFrom ?? "2000-01-01",
    validUntil: dates.validUntil ?? "",
  });
  if (!parsed.success) {
    for (const issue of parsed.error.issues) {
      const field = String(issue.path[0] ?? "");
      // Dates and units already explained above, with the text as written.
      if ((field === "validFrom" || field === "validUntil") && !dates[field] && cell(field) !== "") continue;
      reasons.push(`${LABEL[field] ?? "Row"}: ${issue.message}`);
    }
  }
  if (reasons.length > 0 || !parsed.success || !ingredient) return { ok: false, reasons, ingredientName };
  return { ok: true, ingredient, quote: { ...parsed.data, packKg: parsed.data.unit === "per_pack" ? parsed.data.packKg : null } };
}
