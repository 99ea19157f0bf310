import { randomBytes } from "node:crypto";
import { db } from "@/db/client";
import { memberships, roles, users, workspaces, type Role } from "@/db/schema";
import { lucia } from "@/lib/auth/lucia";
import { hashPassword } from "@/lib/auth/password";
import { generateToken, hashToken } from "@/lib/auth/tokens";
import { requestState } from "./request";

export const FIXTURE_PASSWORD = "tempering-curve-31";
let passwordHash: Promise<string> | null = null;

export function uniqueEmail(label: string): string {
  return `${label}-${randomBytes(4).toString("hex")}@test.example`;
}

export type Person = { id: string; email: string; name: string; role: Role };
export type TeamFixture = { workspaceId: string; people: Record<Role, Person> };

/** A workspace with one member per role (invented names), each its own user. */
export async function createTeam(label = "team"): Promise<TeamFixture> {
  passwordHash ??= hashPassword(FIXTURE_PASSWORD);
  const hash = await passwordHash;
  const [ws] = await db
    .insert(workspaces)
    .values({ name: `${label} works`, slug: `${label}-${randomBytes(4).toString("hex")}` })
    .returning({ id: workspaces.id });
  const people = {} as Record<Role, Person>;
  for (const role of roles) {
    const email = uniqueEmail(`${label}-${role}`);
    const [u] = await db.insert(users).values({ email, name: `${label} ${role}`, passwordHash: hash }).returning({ id: users.id });
    await db.insert(memberships).values({ workspaceId: ws!.id, userId: u!.id, role });
    people[role] = { id: u!.id, email, name: `${label} ${role}`, role };
  }
  return { workspaceId: ws!.id, people };
}

/** Adds a plain member to a workspace (for role changes and removals). */
export async function addMember(workspaceId: string, role: Role = "viewer"): Promise<Person> {
  passwordHash ??= hashPassword(FIXTURE_PASSWORD);
  const email = uniqueEmail(`member-${role}`);
  const [u] = await db.insert(users).values({ email, name: `member ${role}`, passwordHash: await passwordHash }).returning({ id: users.id });
  await db.insert(memberships).values({ workspaceId, userId: u!.id, role });
  return { id: u!.id, email, name: `member ${role}`, role };
}

/** Puts a real database session for the user in this test request's cookie jar. */
export async function signInAs(userId: string, workspaceId: string): Promise<string> {
  const token = generateToken();
  await lucia.createSession(userId, { activeWorkspaceId: workspaceId, createdAt: new Date() }, { sessionId: hashToken(token) });
  requestState.cookieStore.set(lucia.sessionCookieName, token);
  return token;
}

export function signOutOfRequest(): void {
  requestState.cookieStore.clear();
}
