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

/** True for errors pg raises when the server cannot be reached. */
export function isDatabaseUnavailable(err: unknown): boolean {
  const e = err as { code?: string; message?: string } | null;
  if (!e) return false;
  if (e.code && ["ECONNREFUSED", "ECONNRESET", "57P01", "57P03", "08006", "08001"].includes(e.code)) return true;
  return /connection terminated|timeout exceeded when trying to connect|Connection terminated/i.test(e.message ?? "");
}
