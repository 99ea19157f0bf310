import "server-only";
import { redirect } from "next/navigation";
import { cache } from "react";
import type { Role } from "@/db/schema";
import { getMembership, listMembershipsForUser } from "@/lib/data/memberships";
import { orUnavailablePage } from "@/lib/unavailable";
import { getCurrentSession, sessionIdFromCookie } from "./session";
import { authSettings } from "./settings";
import { recentViewer, rememberViewer } from "./viewer-cache";

export type Viewer = {
  user: { id: string; email: string; name: string };
  workspace: { id: string; name: string };
  role: Role;
};

/**
 * The signed-in user in their active workspace (from the session, never from
 * the request), or null. Falls back to the first workspace they belong to.
 */
export const getViewer = cache(async (): Promise<Viewer | null> => (await checkViewer())?.viewer ?? null);

/**
 * For route handlers and server actions (lib/auth/authorize.ts): the same
 * viewer, but taken from this process's short cache when the session was
 * checked within the last few seconds (lib/auth/viewer-cache.ts says what that
 * trades). Cached per request too.
 */
export const getRecentViewer = cache(async (): Promise<Viewer | null> => {
  const sessionId = await sessionIdFromCookie();
  if (!sessionId) return null;
  const hit = recentViewer(sessionId);
  if (hit) return hit;
  const checked = await checkViewer();
  if (!checked) return null;
  rememberViewer(checked.sessionId, checked.viewer, checked.validUntil);
  return checked.viewer;
});

const checkViewer = cache(async (): Promise<{ viewer: Viewer; sessionId: string; validUntil: number } | null> => {
  const { user, session } = await getCurrentSession();
  if (!user || !session) return null;
  let membership = session.activeWorkspaceId
    ? await getMembership({ userId: user.id, workspaceId: session.activeWorkspaceId })
    : null;
  if (!membership) membership = (await listMembershipsForUser({ userId: user.id }))[0] ?? null;
  if (!membership) return null;
  const viewer: Viewer = {
    user: { id: user.id, email: user.email, name: user.name },
    workspace: { id: membership.workspaceId, name: membership.workspaceName },
    role: membership.role,
  };
  // The session ends at its idle expiry or its absolute lifetime, whichever is first.
  const validUntil = Math.min(session.expiresAt.getTime(), session.createdAt.getTime() + authSettings.absoluteLifetimeMinutes * 60_000);
  return { viewer, sessionId: session.id, validUntil };
});

/**
 * For pages: the viewer or null, and when the database cannot be reached a
 * redirect to the 503 page (lib/unavailable.ts) instead of an error page.
 */
export async function getPageViewer(): Promise<Viewer | null> {
  return orUnavailablePage(() => getViewer());
}

/** For pages of the signed-in app: the viewer, or a redirect to sign-in. */
export async function requireViewer(): Promise<Viewer> {
  const viewer = await getPageViewer();
  if (!viewer) redirect("/sign-in");
  return viewer;
}
