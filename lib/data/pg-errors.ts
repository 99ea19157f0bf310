import "server-only";

type PgError = { code?: string; constraint?: string; cause?: unknown };

/** The PostgreSQL error under Drizzle's wrapper, if any. */
function pgError(err: unknown): PgError | null {
  let e = err as PgError | null;
  for (let i = 0; e && i < 3; i++) {
    if (typeof e.code === "string" && /^[0-9A-Z]{5}$/.test(e.code)) return e;
    e = e.cause as PgError | null;
  }
  return null;
}

/** A unique_violation (23505), optionally on one named constraint. */
export function isUniqueViolation(err: unknown, constraint?: string): boolean {
  const e = pgError(err);
  return e?.code === "23505" && (!constraint || e.constraint === constraint);
}

/** A foreign_key_violation (23503). */
export function isForeignKeyViolation(err: unknown): boolean {
  return pgError(err)?.code === "23503";
}
