import "server-only";
import { and, asc, eq } from "drizzle-orm";
import { db } from "@/db/client";
import { memberships, users, workspaces, type Role } from "@/db/schema";

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
