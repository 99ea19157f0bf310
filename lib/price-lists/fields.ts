import { z } from "zod";

/** Our columns a price list's columns can be mapped to. */
export const PRICE_LIST_FIELDS = [
  { key: "ingredient", label: "Ingredient", required: true, hint: "the name in your library" },
  { key: "price", label: "Price", required: true, hint: "in the currency column, or the supplier's" },
  { key: "currency", label: "Currency", required: false, hint: "EUR, GBP, USD…; empty = the supplier's" },
  { key: "unit", label: "Unit", required: false, hint: "per kg, per pack, per tonne; empty = per kg" },
  { key: "packKg", label: "Pack size (kg)", required: false, hint: "for per-pack prices" },
  { key: "minimumOrderKg", label: "Minimum order (kg)", required: false, hint: "" },
  { key: "validFrom", label: "Valid from", required: false, hint: "empty = the date set for the whole list" },
  { key: "validUntil", label: "Valid until", required: false, hint: "empty = open-ended" },
] as const;

export type PriceListField = (typeof PRICE_LIST_FIELDS)[number]["key"];
export type ColumnMapping = Record<PriceListField, number | null>;

// Header words suppliers commonly use (normalised: lower case, letters and digits only).
const SYNONYMS: Record<PriceListField, string[]> = {
  ingredient: ["ingredient", "product", "productname", "item", "description", "article", "name", "material"],
  price: ["price", "unitprice", "netprice", "cost", "priceperunit", "listprice"],
  currency: ["currency", "ccy", "cur", "curr"],
  unit: ["unit", "uom", "priceunit", "per", "unitofmeasure"],
  packKg: ["packkg", "packsize", "packsizekg", "pack", "packweight", "packweightkg", "bagsize", "bagkg"],
  minimumOrderKg: ["minimumorder", "minimumorderkg", "minorder", "minorderkg", "moq", "moqkg"],
  validFrom: ["validfrom", "from", "effective", "effectivefrom", "effectivedate", "startdate", "start"],
  validUntil: ["validuntil", "until", "validto", "to", "expires", "expiry", "enddate", "end"],
};

const norm = (s: string) => s.toLowerCase().replace(/[^a-z0-9]/g, "");

/** A first guess of the mapping from a price list's header row; the person confirms or changes it. */
export function guessMapping(headers: readonly string[]): ColumnMapping {
  const used = new Set<number>();
  const mapping = {} as ColumnMapping;
  for (const field of PRICE_LIST_FIELDS) {
    const words = SYNONYMS[field.key];
    let found: number | null = null;
    // Exact names first, then headers that start with one of the words ("Price EUR/kg").
    for (const exact of [true, false]) {
      if (found !== null) break;
      headers.forEach((h, i) => {
        if (found !== null || used.has(i)) return;
        const n = norm(h);
        if (exact ? words.includes(n) : words.some((w) => w.length > 3 && n.startsWith(w))) found = i;
      });
    }
    if (found !== null) used.add(found);
    mapping[field.key] = found;
  }
  return mapping;
}

const columnIndex = z.number().int().min(0).max(200).nullable();

/**
 * The mapping a person confirmed, as JSON: each of our fields to a column index
 * or null. A column may hold one field only. Whether the required fields are
 * mapped is checked separately (mappingProblems), so an incomplete mapping can
 * still be previewed.
 */
export const columnMappingSchema = z
  .object(Object.fromEntries(PRICE_LIST_FIELDS.map((f) => [f.key, columnIndex])) as Record<PriceListField, typeof columnIndex>)
  .strict()
  .superRefine((m, ctx) => {
    const seen = new Map<number, string>();
    for (const f of PRICE_LIST_FIELDS) {
      const i = m[f.key];
      if (i === null) continue;
      const other = seen.get(i);
      if (other) ctx.addIssue({ code: "custom", path: [f.key], message: `That column is already mapped to “${other}”.` });
      seen.set(i, f.label);
    }
  });

/** What a mapping still lacks before rows can be judged: the ingredient and price columns. */
export function mappingProblems(m: ColumnMapping): Partial<Record<PriceListField, string>> {
  const problems: Partial<Record<PriceListField, string>> = {};
  if (m.ingredient === null) problems.ingredient = "Choose the column with the ingredient names.";
  if (m.price === null) problems.price = "Choose the column with the prices.";
  return problems;
}

export const DATE_FORMATS = ["YYYY-MM-DD", "DD/MM/YYYY", "MM/DD/YYYY", "DD.MM.YYYY"] as const;
export type DateFormat = (typeof DATE_FORMATS)[number];
export type DecimalSeparator = "." | ",";
