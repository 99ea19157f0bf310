import { z } from "zod";
import type { PgColumn } from "drizzle-orm/pg-core";
import type { TableInfo } from "./tables";

/**
 * A zod schema for one row of a table, built from the table's Drizzle columns:
 * every column present (null where the column allows it), nothing else. Values
 * come back in the shape Drizzle inserts (timestamps as Date objects). A column
 * type this file does not know fails loudly at load, so a new kind of column
 * cannot slip through unchecked.
 */
export function rowSchema(table: TableInfo) {
  const shape: Record<string, z.ZodType> = {};
  for (const { key, column } of table.columns) {
    const value = valueSchema(column, `${table.name}.${key}`);
    shape[key] = column.notNull ? value : value.nullable();
  }
  return z.object(shape).strict();
}

const INT4 = 2_147_483_647;

function valueSchema(column: PgColumn, where: string): z.ZodType {
  const c = column as PgColumn & { enumValues?: string[]; length?: number; precision?: number; scale?: number; baseColumn?: PgColumn };
  switch (column.columnType) {
    case "PgUUID":
      return z.guid("Expected an id.");
    case "PgText":
      return z.string().max(1_000_000, "Text too long.");
    case "PgChar":
      return z.string().max(c.length ?? 1, `At most ${c.length ?? 1} characters.`);
    case "PgInteger":
      return z.number().int("Expected a whole number.").min(-INT4 - 1).max(INT4);
    case "PgBoolean":
      return z.boolean();
    case "PgNumeric":
      return decimalSchema(c.precision, c.scale);
    case "PgDateString":
      return z.iso.date("Expected a date like 2026-03-31.");
    case "PgTimestamp":
      return z.iso.datetime({ offset: true, message: "Expected a date and time." }).transform((s) => new Date(s));
    case "PgEnumColumn":
      return z.enum((c.enumValues ?? []) as [string, ...string[]]);
    case "PgJsonb":
      return z.json();
    case "PgArray":
      if (!c.baseColumn) break;
      return z.array(valueSchema(c.baseColumn, where)).max(10_000);
  }
  throw new Error(`workspace export: ${where} has a column type (${column.columnType}) the export does not handle`);
}

/** A decimal string that fits numeric(precision, scale) without rounding. */
function decimalSchema(precision: number | undefined, scale = 0) {
  const decimal = z.string().regex(/^-?\d+(\.\d+)?$/, "Expected a decimal number written as text, like \"12.5\".");
  if (precision === undefined) return decimal;
  return decimal.refine((s) => {
      const [whole = "", fraction = ""] = s.replace(/^-/, "").split(".");
      return whole.replace(/^0+/, "").length <= precision - scale && fraction.replace(/0+$/, "").length <= scale;
    }, `Too many digits (at most ${precision - scale} before and ${scale} after the point).`);
}
