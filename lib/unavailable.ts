import "server-only";
import { headers } from "next/headers";
import { redirect } from "next/navigation";
import { isDatabaseUnavailable } from "@/lib/errors";
import { PATH_HEADER } from "@/lib/unavailable-path";

/**
 * For pages: runs `work`, and when the database cannot be reached sends the
 * browser to /unavailable, which answers 503 with a plain explanation and
 * comes back here. A server component cannot set its own status code (only
 * 404, 401/403 and redirects), so the 503 is the route handler's. Anything
 * else is rethrown to the page's error boundary.
 */
export async function orUnavailablePage<T>(work: () => Promise<T>): Promise<T> {
  try {
    return await work();
  } catch (err) {
    if (!isDatabaseUnavailable(err)) throw err;
    const from = (await headers()).get(PATH_HEADER) ?? "/";
    redirect(`/unavailable?from=${encodeURIComponent(from)}`);
  }
}

/** A same-site path to go back to, or "/" (never another origin: "//x" or "/\\x" would leave the site). */
export function safeReturnPath(from: string | null): string {
  if (!from || !from.startsWith("/") || from.startsWith("//") || from.startsWith("/\\") || from.startsWith("/unavailable")) return "/";
  return from.length > 2000 ? "/" : from;
}
