/**
 * Calling endpoints the way a hostile client would, and judging the answer:
 * a route handler must answer below 500 with `{ error: { message } }` on a
 * refusal; an action must return a result whose failure is a named, human one.
 */
import { expect } from "vitest";
import { base } from "../matrix";
import type { ActionEndpoint, RouteEndpoint } from "./endpoints";

const headers = { origin: base, host: "127.0.0.1:3000", "sec-fetch-site": "same-origin" };

/** Calls a route with a raw body (mutating methods) or query (GET/HEAD). */
export async function callRoute(
  route: RouteEndpoint,
  path: string,
  params: Record<string, string>,
  input: { body?: BodyInit; contentType?: string; query?: Record<string, string> },
): Promise<Response> {
  const url = new URL(`${base}${path}`);
  for (const [k, v] of Object.entries(input.query ?? {})) url.searchParams.set(k, v);
  const mutates = !["GET", "HEAD"].includes(route.method);
  const h: Record<string, string> = { ...headers };
  if (input.contentType) h["content-type"] = input.contentType;
  const request = new Request(url, { method: route.method, headers: h, body: mutates ? input.body : undefined });
  return route.handler(request, { params: Promise.resolve(params) });
}

/** A route's answer to hostile input: a success, or a 4xx with a message a person can read. */
export async function expectHandled(route: RouteEndpoint, res: Response, what: string): Promise<void> {
  const context = `${route.name} with ${what}`;
  expect(res.status, context).toBeLessThan(500);
  if (res.status >= 400) {
    const body = (await res.json()) as { error?: { message?: unknown } };
    expect(typeof body.error?.message, context).toBe("string");
    expect((body.error?.message as string).length, context).toBeGreaterThan(5);
    expect(body.error?.message as string, context).not.toMatch(/\bat \w+ \(|node_modules|stack|syntax error at or near/i);
  } else {
    await res.arrayBuffer();
  }
}

export type ActionOutcome = { ok: boolean; code?: string; message?: string };

/** Runs an action with its arguments; a thrown redirect counts as a handled answer. */
export async function callAction(action: ActionEndpoint, args: unknown[]): Promise<ActionOutcome | "redirect"> {
  try {
    return (await action.fn(...args)) as ActionOutcome;
  } catch (err) {
    const digest = (err as { digest?: unknown }).digest;
    if (typeof digest === "string" && /^NEXT_(REDIRECT|HTTP_ERROR_FALLBACK)/.test(digest)) return "redirect";
    throw new Error(`${action.name} threw instead of returning a result: ${(err as Error).message}`);
  }
}

const HUMAN_FAILURES = ["invalid", "not_found", "conflict", "forbidden", "unauthenticated", "rate_limited"];

export function expectActionHandled(action: ActionEndpoint, result: ActionOutcome | "redirect", what: string): void {
  if (result === "redirect") return;
  const context = `${action.name} with ${what}`;
  expect(typeof result?.ok, context).toBe("boolean");
  if (result.ok) return;
  expect(HUMAN_FAILURES, `${context}: ${result.code} ${result.message}`).toContain(result.code);
  expect(typeof result.message, context).toBe("string");
  expect((result.message ?? "").length, context).toBeGreaterThan(5);
}
