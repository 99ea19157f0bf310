import "server-only";
import { and, asc, eq } from "drizzle-orm";
import { db } from "@/db/client";
import { memberships, users, workspaces, type Role } from "@/db/schema";
import { forgetViewersOf } from "@/lib/auth/viewer-cache";
import { conflict, notFound } from "@/lib/errors";

export type WorkspaceMembership = { workspaceId: string; workspaceName: string; role: Role };

/** Every workspace the user belongs to, by name. */
export async function listMembershipsForUser({ userId }: { userId: string }): Promise<WorkspaceMembership[]> {
  return db
    .select({ workspaceId: workspaces.id, workspaceName: workspaces.name, role: memberships.role })
    .from(memberships)
    .innerJoin(workspaces, eq(workspaces.id, memberships.workspaceId))
    .where(eq(memberships.userId, userId))
    .orderBy(asc(workspaces.name));
}

/** The user's membership of one workspace, or null when they are not a member. */
export async function getMembership({
  userId,
  workspaceId,
}: {
  userId: string;
  workspaceId: string;
}): Promise<WorkspaceMembership | null> {
  const [row] = await db
    .select({ workspaceId: workspaces.id, workspaceName: workspaces.name, role: memberships.role })
    .from(memberships)
    .innerJoin(workspaces, eq(workspaces.id, memberships.workspaceId))
    .where(and(eq(memberships.userId, userId), eq(memberships.workspaceId, workspaceId)));
  return row ?? null;
}

export type Member = { userId: string; name: string; email: string; role: Role };

/** The people of a workspace, owners first then by name. */
export async function listMembers({ workspaceId }: { workspaceId: string }): Promise<Member[]> {
  const rows = await db
    .select({ userId: users.id, name: users.name, email: users.email, role: memberships.role })
    .from(memberships)
    .innerJoin(users, eq(users.id, memberships.userId))
    .where(eq(memberships.workspaceId, workspaceId))
    .orderBy(asc(users.name));
  const order: Role[] = ["owner", "formulator", "buyer", "production", "viewer"];
  return rows.sort((a, b) => order.indexOf(a.role) - order.indexOf(b.role));
}

async function ownerCount(workspaceId: string): Promise<number> {
  const rows = await db
    .select({ id: memberships.id })
    .from(memberships)
    .where(and(eq(memberships.workspaceId, workspaceId), eq(memberships.role, "owner")));
  return rows.length;
}

/** Changes a member's role; a workspace always keeps at least one owner. */
export async function changeMemberRole({
  workspaceId,
  userId,
  role,
}: {
  workspaceId: string;
  userId: string;
  role: Role;
}): Promise<void> {
  const current = await getMembership({ userId, workspaceId });
  if (!current) throw notFound("That member");
  if (current.role === "owner" && role !== "owner" && (await ownerCount(workspaceId)) <= 1) {
    throw conflict("A workspace needs at least one owner. Make someone else owner first.");
  }
  await db
    .update(memberships)
    .set({ role })
    .where(and(eq(memberships.workspaceId, workspaceId), eq(memberships.userId, userId)));
  forgetViewersOf(userId);
}

/** Removes a member from a workspace; the last owner cannot be removed. */
export async function removeMember({ workspaceId, userId }: { workspaceId: string; userId: string }): Promise<void> {
  const current = await getMembership({ userId, workspaceId });
  if (!current) throw notFound("That member");
  if (current.role === "owner" && (await ownerCount(workspaceId)) <= 1) {
    throw conflict("The last owner cannot be removed.");
  }
  await db.delete(memberships).where(and(eq(memberships.workspaceId, workspaceId), eq(memberships.userId, userId)));
  forgetViewersOf(userId);
}
