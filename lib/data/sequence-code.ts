import "server-only";
import { and, eq, like } from "drizzle-orm";
import type { AnyPgColumn, PgTable } from "drizzle-orm/pg-core";
import type { Executor } from "./recipes-db";
import { isUniqueViolation } from "./pg-errors";

/**
 * Inserts a row under the next human code of a yearly series ("B-2026-0007",
 * "PO-2026-0012"): the highest number used this year + 1, four digits or more.
 * Two people planning at the same moment race for a number; the loser's insert
 * hits the unique constraint and simply takes the next one.
 */
export async function insertWithNextCode<T>(opts: {
  executor: Executor;
  table: PgTable;
  workspaceColumn: AnyPgColumn;
  codeColumn: AnyPgColumn;
  constraint: string;
  workspaceId: string;
  prefix: string;
  year: number;
  insert: (code: string, tx: Executor) => Promise<T>;
}): Promise<T> {
  const series = `${opts.prefix}-${opts.year}-`;
  for (let attempt = 0; attempt < 8; attempt++) {
    const rows = await opts.executor
      .select({ code: opts.codeColumn })
      .from(opts.table)
      .where(and(eq(opts.workspaceColumn, opts.workspaceId), like(opts.codeColumn, `${series}%`)));
    const highest = rows.reduce((max, r) => Math.max(max, Number(String(r.code).slice(series.length)) || 0), 0);
    const code = `${series}${String(highest + 1 + attempt).padStart(4, "0")}`;
    try {
      // A savepoint, so a lost race does not abort the caller's transaction.
      return await opts.executor.transaction(async (savepoint) => opts.insert(code, savepoint));
    } catch (err) {
      if (!isUniqueViolation(err, opts.constraint)) throw err;
    }
  }
  throw new Error(`could not find a free code in ${series}`);
}
