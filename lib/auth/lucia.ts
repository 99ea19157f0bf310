import { DrizzlePostgreSQLAdapter } from "@lucia-auth/adapter-drizzle";
import { Lucia, TimeSpan } from "lucia";
import { db } from "@/db/client";
import { sessions, users } from "@/db/schema";
import { authSettings } from "./settings";

const adapter = new DrizzlePostgreSQLAdapter(db, sessions, users);

/**
 * Lucia v3 database sessions. The session id stored in the database is the
 * SHA-256 of the cookie's token (see session.ts); Lucia only ever sees the hash.
 * Lucia slides the expiry (idle timeout); session.ts adds the absolute lifetime.
 */
export const lucia = new Lucia(adapter, {
  sessionExpiresIn: new TimeSpan(authSettings.idleTimeoutMinutes, "m"),
  sessionCookie: {
    name: authSettings.cookieName,
    expires: false,
    attributes: { secure: authSettings.secureCookies, sameSite: "lax", path: "/" },
  },
  getSessionAttributes: (attrs) => ({
    activeWorkspaceId: attrs.activeWorkspaceId,
    createdAt: attrs.createdAt,
  }),
  getUserAttributes: (attrs) => ({ email: attrs.email, name: attrs.name }),
});

declare module "lucia" {
  interface Register {
    Lucia: typeof lucia;
    UserId: string;
    DatabaseSessionAttributes: { activeWorkspaceId: string | null; createdAt: Date };
    DatabaseUserAttributes: { email: string; name: string };
  }
}
