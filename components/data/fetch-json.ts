import { mutate } from "swr";

/** SWR's fetcher for our route handlers: JSON, or an Error carrying the handler's message. */
export async function fetchJson<T>(url: string): Promise<T> {
  const res = await fetch(url, { headers: { accept: "application/json" } });
  const body = (await res.json().catch(() => null)) as (T & { error?: { message?: string } }) | null;
  if (!res.ok) throw new Error(body?.error?.message ?? `The server answered ${res.status}.`);
  return body as T;
}

/** Refetches every cached list whose URL starts with one of the prefixes (after an import or a new quote). */
export function refreshLists(...prefixes: string[]): Promise<unknown> {
  return mutate((key) => typeof key === "string" && prefixes.some((p) => key.startsWith(p)));
}
