import type { Viewer } from "./current";

/**
 * Signed-in viewers recently checked against the database, by session id, kept
 * in this process for up to VIEWER_TTL_MS: what route handlers and server
 * actions (lib/auth/authorize.ts) read, so a burst of API calls (the bench's
 * evaluations, an integration) does not make two queries each just to learn
 * who is asking. Pages always check afresh (lib/auth/current.ts getViewer).
 *
 * What this process changes it forgets at once: sign-out, sign-out everywhere,
 * password change or reset, a role change or removal, a workspace switch
 * (lib/auth/session.ts, lib/data/memberships.ts, lib/data/sessions.ts). Another
 * server process (several behind a load balancer) may honour a session ended
 * elsewhere, or an old role, for up to VIEWER_TTL_MS: the price of the speed.
 * BARWRIGHT_VIEWER_CACHE_MS=0 turns the cache off.
 *
 * Entries never outlive their session: each keeps the earlier of its TTL, the
 * session's idle expiry and its absolute lifetime. One map per process (on
 * globalThis: route handlers, actions and pages are bundled apart).
 */
export const VIEWER_TTL_MS = ttlFromEnv(process.env.BARWRIGHT_VIEWER_CACHE_MS, 5_000);
const MAX_ENTRIES = 10_000;

type Entry = { viewer: Viewer; until: number };
type Store = Map<string, Entry>;

const KEY = Symbol.for("barwright.viewer-cache");
const holder = globalThis as typeof globalThis & { [KEY]?: Store };
const store: Store = (holder[KEY] ??= new Map());

export function ttlFromEnv(raw: string | undefined, fallback: number): number {
  if (raw === undefined || raw.trim() === "") return fallback;
  const n = Number(raw);
  return Number.isFinite(n) && n >= 0 ? Math.min(n, 60_000) : fallback;
}

/** The viewer of `sessionId` if this process checked it within the TTL (and the session has not expired since). */
export function recentViewer(sessionId: string, now = Date.now()): Viewer | null {
  const hit = store.get(sessionId);
  if (!hit) return null;
  if (now >= hit.until) {
    store.delete(sessionId);
    return null;
  }
  return hit.viewer;
}

/** Keeps a viewer just checked against the database, until `validUntil` at the latest (the session's own end). */
export function rememberViewer(sessionId: string, viewer: Viewer, validUntil: number, now = Date.now(), ttl = VIEWER_TTL_MS): void {
  if (ttl <= 0) return;
  const until = Math.min(now + ttl, validUntil);
  if (until <= now) return;
  store.delete(sessionId);
  store.set(sessionId, { viewer, until });
  // Oldest first in a Map: drop the oldest when full.
  while (store.size > MAX_ENTRIES) store.delete(store.keys().next().value!);
}

/** Forgets one session (sign-out, workspace switch). */
export function forgetSession(sessionId: string): void {
  store.delete(sessionId);
}

/** Forgets every session of a person (sign-out everywhere, password change, role change, removal). */
export function forgetViewersOf(userId: string): void {
  for (const [id, entry] of store) if (entry.viewer.user.id === userId) store.delete(id);
}

/** Forgets everything (tests; a change that touches many people at once). */
export function forgetAllViewers(): void {
  store.clear();
}
