import "server-only";
import { createHash } from "node:crypto";
import { and, desc, eq, inArray } from "drizzle-orm";
import { db } from "@/db/client";
import { ingredients, priceListImports, priceQuotes } from "@/db/schema";
import { getBaseCurrency, listExchangeRates } from "@/lib/data/exchange-rates";
import { listQuotes } from "@/lib/data/quotes";
import { getSupplierById } from "@/lib/data/suppliers";
import { invalid } from "@/lib/errors";
import { percentChange, quotePerKgInBase } from "@/lib/pricing/convert";
import { quoteDedupeKey } from "@/lib/pricing/dedupe-key";
import { decodePriceList } from "./decode";
import { guessMapping, mappingProblems, type ColumnMapping, type DateFormat, type DecimalSeparator, type PriceListField } from "./fields";
import { parsePriceListCsv } from "./parse";
import { readPriceListRow, type IngredientRef, type ReadRow } from "./read-row";

export type RowStatus = "new" | "already_imported" | "duplicate_in_file" | "invalid";

export type QuoteValues = Extract<ReadRow, { ok: true }>["quote"];

export type RowResult = {
  rowNumber: number;
  status: RowStatus;
  reasons: string[];
  ingredientName: string;
  ingredientId: string | null;
  quote: QuoteValues | null;
  /** Price per kg in the base currency at the rate of its valid-from day (null when not convertible). */
  perKgBase: string | null;
  /** This supplier's current price per kg for the ingredient before this upload, and the change in %. */
  previousPerKgBase: string | null;
  changePercent: string | null;
  dedupeKey: string | null;
};

export type PriceListCheck = {
  fileName: string;
  fileSha256: string;
  encoding: string;
  delimiter: string;
  headers: string[];
  /** Data rows in the file (judged or not). */
  rowCount: number;
  /** First rows as written, for the mapping step. */
  sample: string[][];
  mapping: ColumnMapping;
  /** Required fields not mapped yet; while any is listed, no row is judged. */
  mappingProblems: Partial<Record<PriceListField, string>>;
  supplier: { id: string; name: string; currency: string };
  baseCurrency: string;
  rows: RowResult[];
  counts: Record<RowStatus, number>;
  /** When this same file (by SHA-256) was imported for this supplier before. */
  sameFileImportedAt: string | null;
};

export type CheckOptions = {
  decimalSeparator: DecimalSeparator;
  dateFormat: DateFormat;
  defaultValidFrom: string | null;
};

const nameKey = (s: string) => s.normalize("NFKC").trim().replace(/\s+/g, " ").toLowerCase();

/**
 * Reads a supplier's price list and judges every row without writing anything:
 * the preview and column-mapping step. With no mapping it guesses one from the
 * header row. A file that cannot be read at all (not CSV, too large, unknown
 * encoding, too many rows) is an `invalid` error with the reason.
 */
export async function checkPriceList(args: {
  workspaceId: string;
  supplierId: string;
  fileName: string;
  bytes: Uint8Array;
  mapping: ColumnMapping | null;
  options: CheckOptions;
  today: string;
}): Promise<PriceListCheck> {
  const supplier = await getSupplierById({ workspaceId: args.workspaceId, supplierId: args.supplierId });
  if (supplier.archived) throw invalid(`${supplier.name} is archived; restore it before uploading its prices.`);
  const decoded = await decodePriceList(args.bytes);
  if (!decoded.ok) throw invalid(decoded.reason, { file: [decoded.reason] });
  const parsed = parsePriceListCsv(decoded.text);
  if (!parsed.ok) throw invalid(parsed.reason, { file: [parsed.reason] });
  const mapping = args.mapping ?? guessMapping(parsed.headers);
  for (const [field, index] of Object.entries(mapping)) {
    if (index !== null && index >= parsed.headers.length) {
      throw invalid("The column mapping does not fit this file.", { [`mapping.${field}`]: ["That column is not in this file."] });
    }
  }

  const library = await db
    .select({ id: ingredients.id, name: ingredients.name, archivedAt: ingredients.archivedAt })
    .from(ingredients)
    .where(eq(ingredients.workspaceId, args.workspaceId));
  const byName = new Map<string, IngredientRef>(library.map((i) => [nameKey(i.name), { id: i.id, name: i.name, archived: i.archivedAt !== null }]));
  const readOptions = { ...args.options, mapping, defaultCurrency: supplier.currency };

  const problems = mappingProblems(mapping);
  const judged = Object.keys(problems).length === 0 ? parsed.rows : [];
  const seen = new Map<string, number>();
  const rows: RowResult[] = judged.map(({ rowNumber, cells }) => {
    const read = readPriceListRow(cells, readOptions, (name) => byName.get(nameKey(name)));
    const blank = { rowNumber, perKgBase: null, previousPerKgBase: null, changePercent: null };
    if (!read.ok) {
      return { ...blank, status: "invalid", reasons: read.reasons, ingredientName: read.ingredientName, ingredientId: null, quote: null, dedupeKey: null };
    }
    const dedupeKey = quoteDedupeKey({ supplierId: supplier.id, ingredientId: read.ingredient.id, ...read.quote });
    const earlier = seen.get(dedupeKey);
    if (earlier === undefined) seen.set(dedupeKey, rowNumber);
    return {
      ...blank,
      status: earlier === undefined ? "new" : "duplicate_in_file",
      reasons: earlier === undefined ? [] : [`The same quote as row ${earlier}.`],
      ingredientName: read.ingredient.name,
      ingredientId: read.ingredient.id,
      quote: read.quote,
      dedupeKey,
    };
  });

  await markAlreadyImported(args.workspaceId, rows);
  const baseCurrency = await compareWithHistory(args.workspaceId, supplier.id, rows, args.today);
  const fileSha256 = createHash("sha256").update(args.bytes).digest("hex");
  const [previous] = await db
    .select({ createdAt: priceListImports.createdAt })
    .from(priceListImports)
    .where(and(eq(priceListImports.workspaceId, args.workspaceId), eq(priceListImports.supplierId, supplier.id), eq(priceListImports.fileSha256, fileSha256)))
    .orderBy(desc(priceListImports.createdAt))
    .limit(1);

  const counts: Record<RowStatus, number> = { new: 0, already_imported: 0, duplicate_in_file: 0, invalid: 0 };
  for (const r of rows) counts[r.status]++;
  return {
    fileName: args.fileName,
    fileSha256,
    encoding: decoded.encoding,
    delimiter: parsed.delimiter,
    headers: parsed.headers,
    sample: parsed.rows.slice(0, 5).map((r) => r.cells),
    mapping,
    mappingProblems: problems,
    rowCount: parsed.rows.length,
    supplier: { id: supplier.id, name: supplier.name, currency: supplier.currency },
    baseCurrency,
    rows,
    counts,
    sameFileImportedAt: previous ? previous.createdAt.toISOString() : null,
  };
}

/** Rows whose quote is already recorded (an earlier upload or by hand) will not be imported again. */
async function markAlreadyImported(workspaceId: string, rows: RowResult[]): Promise<void> {
  const keys = rows.filter((r) => r.status === "new").map((r) => r.dedupeKey!);
  if (keys.length === 0) return;
  const existing = await db
    .select({ key: priceQuotes.dedupeKey })
    .from(priceQuotes)
    .where(and(eq(priceQuotes.workspaceId, workspaceId), inArray(priceQuotes.dedupeKey, keys)));
  const known = new Set(existing.map((e) => e.key));
  for (const r of rows) {
    if (r.status === "new" && known.has(r.dedupeKey!)) {
      r.status = "already_imported";
      r.reasons = ["Already recorded: this quote was imported or entered before."];
    }
  }
}

/** Fills each row's price per kg in base currency and the change from the supplier's current price. */
async function compareWithHistory(workspaceId: string, supplierId: string, rows: RowResult[], today: string): Promise<string> {
  const [baseCurrency, rates, history] = await Promise.all([
    getBaseCurrency({ workspaceId }),
    listExchangeRates({ workspaceId }),
    listQuotes({ workspaceId, supplierId, on: today }),
  ]);
  const currentByIngredient = new Map(history.quotes.filter((q) => q.current).map((q) => [q.ingredientId, q.perKgBase]));
  for (const r of rows) {
    if (!r.quote || !r.ingredientId) continue;
    const converted = quotePerKgInBase(r.quote, { base: baseCurrency, rates, on: r.quote.validFrom });
    r.perKgBase = converted.ok ? converted.value.perKg : null;
    if (!converted.ok && r.status === "new") r.reasons = [`Imported, but not yet costed: ${converted.reason}`];
    const previous = currentByIngredient.get(r.ingredientId) ?? null;
    r.previousPerKgBase = previous;
    r.changePercent = previous && r.perKgBase ? percentChange(previous, r.perKgBase) : null;
  }
  return baseCurrency;
}
