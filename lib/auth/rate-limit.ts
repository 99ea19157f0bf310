import "server-only";
import { RateLimiterMemory, RateLimiterRes } from "rate-limiter-flexible";
import { AppError } from "@/lib/errors";

/**
 * Brute-force limits (rate-limiter-flexible, in-process memory store: Barwright
 * runs one server process per deployment). Per account and per IP address.
 */
const limiters = {
  signInAccount: new RateLimiterMemory({ keyPrefix: "signin-acct", points: 5, duration: 15 * 60 }),
  signInIp: new RateLimiterMemory({ keyPrefix: "signin-ip", points: 50, duration: 15 * 60 }),
  resetAccount: new RateLimiterMemory({ keyPrefix: "reset-acct", points: 3, duration: 60 * 60 }),
  resetIp: new RateLimiterMemory({ keyPrefix: "reset-ip", points: 20, duration: 60 * 60 }),
} as const;

export type LimiterName = keyof typeof limiters;

function tooMany(res: RateLimiterRes): AppError {
  const minutes = Math.max(1, Math.ceil(res.msBeforeNext / 60_000));
  return new AppError("rate_limited", `Too many attempts. Wait ${minutes} minute${minutes === 1 ? "" : "s"} and try again.`);
}

/** Throws a rate_limited AppError when `key` has no attempts left; otherwise uses one. */
export async function consume(name: LimiterName, key: string): Promise<void> {
  try {
    await limiters[name].consume(key.toLowerCase());
  } catch (res) {
    if (res instanceof RateLimiterRes) throw tooMany(res);
    throw res;
  }
}

/** Throws when `key` is already blocked, without using an attempt. */
export async function ensureNotBlocked(name: LimiterName, key: string): Promise<void> {
  const res = await limiters[name].get(key.toLowerCase());
  if (res && res.remainingPoints <= 0 && res.msBeforeNext > 0) throw tooMany(res);
}

export async function reset(name: LimiterName, key: string): Promise<void> {
  await limiters[name].delete(key.toLowerCase());
}

/** The client's address as the server saw it (Next.js sets x-forwarded-for). */
export function clientIp(headers: Headers): string {
  return headers.get("x-forwarded-for")?.split(",")[0]?.trim() || headers.get("x-real-ip") || "unknown";
}
