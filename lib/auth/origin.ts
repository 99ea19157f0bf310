import "server-only";
import { headers } from "next/headers";

/**
 * The address people reach Barwright at, for links in e-mails:
 * BARWRIGHT_ORIGIN when set (production), else the request's own host.
 */
export async function appOrigin(): Promise<string> {
  if (process.env.BARWRIGHT_ORIGIN) return process.env.BARWRIGHT_ORIGIN.replace(/\/$/, "");
  const h = await headers();
  const host = h.get("x-forwarded-host") ?? h.get("host") ?? "127.0.0.1:3000";
  const proto = h.get("x-forwarded-proto") ?? "http";
  return `${proto}://${host}`;
}
