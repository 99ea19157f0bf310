/**
 * The one error family of Barwright. Services and data functions throw these;
 * the action wrapper turns them into `{ ok: false, code, message }` and the
 * route-handler wrapper into the matching HTTP status. Anything else is a bug
 * and becomes a 500 with no detail.
 */
export type ErrorCode =
  | "unauthenticated"
  | "forbidden"
  | "not_found"
  | "invalid"
  | "conflict"
  | "rate_limited"
  | "unavailable";

export const httpStatus: Record<ErrorCode, number> = {
  unauthenticated: 401,
  forbidden: 403,
  not_found: 404,
  conflict: 409,
  invalid: 422,
  rate_limited: 429,
  unavailable: 503,
};

export class AppError extends Error {
  constructor(
    readonly code: ErrorCode,
    message: string,
    readonly fieldErrors?: Record<string, string[] | undefined>,
  ) {
    super(message);
    this.name = "AppError";
  }
}

export const unauthenticated = () => new AppError("unauthenticated", "Sign in to continue.");
export const forbidden = (what = "do that") => new AppError("forbidden", `Your role does not allow you to ${what}.`);
export const notFound = (what = "That item") => new AppError("not_found", `${what} was not found.`);
export const conflict = (message: string) => new AppError("conflict", message);
export const invalid = (message: string, fieldErrors?: Record<string, string[] | undefined>) =>
  new AppError("invalid", message, fieldErrors);

/**
 * True for errors pg raises when the server cannot be reached, has gone away or
 * stopped answering in time. Drizzle wraps driver errors (`cause`), so the
 * chain is followed a few levels.
 */
export function isDatabaseUnavailable(err: unknown): boolean {
  for (let e = err as { code?: unknown; message?: unknown; cause?: unknown } | null, depth = 0; e && depth < 5; depth++) {
    if (typeof e.code === "string" && UNAVAILABLE_CODES.includes(e.code)) return true;
    if (typeof e.message === "string" && UNAVAILABLE_MESSAGE.test(e.message)) return true;
    e = (e.cause ?? null) as typeof e;
  }
  return false;
}

// Socket errors, then SQLSTATEs: 57P01-57P03 admin/crash shutdown and cannot connect now,
// 57014 statement timeout, 08xxx connection exceptions, 53300 too many connections.
const UNAVAILABLE_CODES = ["ECONNREFUSED", "ECONNRESET", "EPIPE", "ETIMEDOUT", "57P01", "57P02", "57P03", "57014", "08000", "08003", "08006", "08001", "08004", "53300"];
const UNAVAILABLE_MESSAGE = /connection terminated|timeout exceeded when trying to connect|query read timeout|not queryable|connection ended/i;
