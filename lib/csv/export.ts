/**
 * CSV export that a spreadsheet cannot turn into a formula. Follows the OWASP
 * "CSV Injection" guidance: a cell starting with = + - @, a tab or a carriage
 * return is prefixed with a single quote so the spreadsheet shows it as text;
 * every cell is then quoted per RFC 4180 (double quotes doubled). Pure; used by
 * every CSV download in Barwright.
 */

/** The characters that make a spreadsheet read a cell as a formula (OWASP CSV Injection). */
const FORMULA_START = /^[=+\-@\t\r]/;

export type CsvCell = string | number | boolean | null | undefined;

/** One cell made safe: formula triggers neutralised, then quoted (RFC 4180 §2.5–2.7). */
export function escapeCsvCell(value: CsvCell): string {
  if (value === null || value === undefined) return '""';
  let text = String(value);
  // A negative number is still a number for the reader; only text is neutralised.
  const isPlainNumber = typeof value === "number" || /^-?\d+(\.\d+)?$/.test(text);
  if (!isPlainNumber && FORMULA_START.test(text)) text = `'${text}`;
  return `"${text.replace(/"/g, '""')}"`;
}

/** A whole CSV document: header line, one line per row, CRLF line ends (RFC 4180 §2.1). */
export function toCsv<Row>(columns: ReadonlyArray<{ header: string; value: (row: Row) => CsvCell }>, rows: readonly Row[]): string {
  const lines = [columns.map((c) => escapeCsvCell(c.header)).join(",")];
  for (const row of rows) lines.push(columns.map((c) => escapeCsvCell(c.value(row))).join(","));
  return `${lines.join("\r\n")}\r\n`;
}

/** A download response for a CSV document (UTF-8 with a BOM so spreadsheets read accents right). */
export function csvResponse(csv: string, fileName: string): Response {
  return new Response(`\uFEFF${csv}`, {
    headers: {
      "content-type": "text/csv; charset=utf-8",
      "content-disposition": `attachment; filename="${fileName.replace(/[^A-Za-z0-9._-]/g, "_")}"`,
      "cache-control": "no-store",
      "x-content-type-options": "nosniff",
    },
  });
}
