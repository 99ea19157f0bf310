import "server-only";
import { cookies } from "next/headers";
import { cache } from "react";
import { lucia } from "./lucia";
import { authSettings } from "./settings";
import { generateToken, hashToken } from "./tokens";
import { forgetSession, forgetViewersOf } from "./viewer-cache";

/** The database session id for a cookie's token. */
export const sessionIdFromToken = hashToken;

/** Creates a fresh session (a new one at every sign-in) and sets its cookie. */
export async function startSession(userId: string, activeWorkspaceId: string | null): Promise<void> {
  const token = generateToken();
  await lucia.createSession(userId, { activeWorkspaceId, createdAt: new Date() }, { sessionId: sessionIdFromToken(token) });
  const cookie = lucia.createSessionCookie(token);
  (await cookies()).set(cookie.name, cookie.value, cookie.attributes);
}

/** The database session id named by this request's cookie (not yet checked), or null. */
export async function sessionIdFromCookie(): Promise<string | null> {
  const token = (await cookies()).get(lucia.sessionCookieName)?.value;
  return token ? sessionIdFromToken(token) : null;
}

/**
 * The signed-in user and session for this request, or nulls. Enforces the
 * absolute lifetime on top of Lucia's sliding idle timeout. Cached per request.
 */
export const getCurrentSession = cache(async () => {
  const jar = await cookies();
  const token = jar.get(lucia.sessionCookieName)?.value ?? null;
  if (!token) return { user: null, session: null } as const;
  const sessionId = sessionIdFromToken(token);
  const result = await lucia.validateSession(sessionId);
  if (result.session) {
    const ageMinutes = (Date.now() - result.session.createdAt.getTime()) / 60_000;
    if (ageMinutes > authSettings.absoluteLifetimeMinutes) {
      await lucia.invalidateSession(sessionId);
      trySetCookie(jar, lucia.createBlankSessionCookie());
      return { user: null, session: null } as const;
    }
    // Lucia extended the idle expiry: refresh the cookie (it carries the token, not the id).
    if (result.session.fresh) trySetCookie(jar, lucia.createSessionCookie(token));
  } else {
    trySetCookie(jar, lucia.createBlankSessionCookie());
  }
  return result;
});

/** Deletes every session of a user: sign out everywhere, password change, removal. */
// The viewer cache is cleared before and after the delete: a request checked in between is not kept.
export async function endAllSessionsOf(userId: string): Promise<void> {
  forgetViewersOf(userId);
  await lucia.invalidateUserSessions(userId);
  forgetViewersOf(userId);
}

/** Ends this request's session and clears the cookie. */
export async function endCurrentSession(): Promise<void> {
  const { session } = await getCurrentSession();
  if (session) {
    forgetSession(session.id);
    await lucia.invalidateSession(session.id);
    forgetSession(session.id);
  }
  const blank = lucia.createBlankSessionCookie();
  (await cookies()).set(blank.name, blank.value, blank.attributes);
}

type Jar = Awaited<ReturnType<typeof cookies>>;
type LuciaCookie = ReturnType<typeof lucia.createBlankSessionCookie>;

// Server components may not set cookies; actions and route handlers may. Either is fine here.
function trySetCookie(jar: Jar, cookie: LuciaCookie) {
  try {
    jar.set(cookie.name, cookie.value, cookie.attributes);
  } catch {
    /* rendering a server component: the next action or route handler refreshes it */
  }
}
