import Papa from "papaparse";
import { MAX_PRICE_LIST_ROWS } from "./limits";

export type ParsedCsv =
  | { ok: true; headers: string[]; rows: { rowNumber: number; cells: string[] }[]; delimiter: string }
  | { ok: false; reason: string };

/**
 * Splits CSV text into a header row and data rows (papaparse; the delimiter —
 * comma, semicolon, tab or bar — is detected). `rowNumber` is the row as a
 * spreadsheet shows it (the header is row 1); blank rows are skipped but keep
 * their number. Refuses files with no data, a single column, or more than
 * MAX_PRICE_LIST_ROWS rows.
 */
export function parsePriceListCsv(text: string): ParsedCsv {
  // Guess the delimiter on non-blank lines only (blank lines would look like one-column rows),
  // then split the whole file with it so row numbers stay those of the file.
  const guess = Papa.parse<string[]>(text, { delimiter: "", delimitersToGuess: [",", ";", "\t", "|"], skipEmptyLines: "greedy", preview: 50 });
  const result = Papa.parse<string[]>(text, {
    delimiter: guess.meta.delimiter || ",",
    skipEmptyLines: false,
    // One more than the cap (plus the header), so "too many rows" can be told apart.
    preview: MAX_PRICE_LIST_ROWS + 50,
  });
  const records = result.data.map((cells, i) => ({ rowNumber: i + 1, cells: cells.map((c) => (c ?? "").trim()) }));
  const nonBlank = records.filter((r) => r.cells.some((c) => c !== ""));
  const [header, ...rows] = nonBlank;
  if (!header) return { ok: false, reason: "That file has no rows." };
  if (header.cells.length < 2) {
    return { ok: false, reason: "We found only one column. A price list needs at least an ingredient column and a price column, separated by commas or semicolons." };
  }
  if (rows.length === 0) return { ok: false, reason: "That file has a header row but no price rows." };
  if (rows.length > MAX_PRICE_LIST_ROWS) {
    return { ok: false, reason: `That file has more than ${MAX_PRICE_LIST_ROWS} rows. Split it and upload the parts.` };
  }
  const quoteError = result.errors.find((e) => e.type === "Quotes");
  if (quoteError) {
    const row = (quoteError.row ?? 0) + 1;
    return { ok: false, reason: `Row ${row} has an opening quote mark that is never closed, so the rows after it cannot be read. Fix it and upload again.` };
  }
  const headers = header.cells.map((h, i) => h || `Column ${i + 1}`);
  return { ok: true, headers, rows, delimiter: result.meta.delimiter };
}
