import "server-only";
import { and, desc, eq, gt, isNull } from "drizzle-orm";
import { db } from "@/db/client";
import { invitations, memberships, users, workspaces, type Role } from "@/db/schema";
import { conflict, notFound } from "@/lib/errors";

export type PendingInvitation = { id: string; email: string; role: Role; expiresAt: Date; createdAt: Date };

export async function createInvitation(input: {
  workspaceId: string;
  email: string;
  role: Role;
  tokenHash: string;
  invitedById: string;
  expiresAt: Date;
}): Promise<{ id: string }> {
  const [row] = await db.insert(invitations).values(input).returning({ id: invitations.id });
  if (!row) throw new Error("insert returned no row");
  return row;
}

/** Invitations not yet accepted, revoked or expired. */
export async function listPendingInvitations({ workspaceId }: { workspaceId: string }): Promise<PendingInvitation[]> {
  return db
    .select({
      id: invitations.id,
      email: invitations.email,
      role: invitations.role,
      expiresAt: invitations.expiresAt,
      createdAt: invitations.createdAt,
    })
    .from(invitations)
    .where(
      and(
        eq(invitations.workspaceId, workspaceId),
        isNull(invitations.acceptedAt),
        isNull(invitations.revokedAt),
        gt(invitations.expiresAt, new Date()),
      ),
    )
    .orderBy(desc(invitations.createdAt));
}

export async function revokeInvitation({ workspaceId, invitationId }: { workspaceId: string; invitationId: string }) {
  const rows = await db
    .update(invitations)
    .set({ revokedAt: new Date() })
    .where(
      and(
        eq(invitations.id, invitationId),
        eq(invitations.workspaceId, workspaceId),
        isNull(invitations.acceptedAt),
        isNull(invitations.revokedAt),
      ),
    )
    .returning({ id: invitations.id });
  if (rows.length === 0) throw notFound("That invitation");
}

export type InvitationLookup = {
  id: string;
  workspaceId: string;
  workspaceName: string;
  email: string;
  role: Role;
  state: "pending" | "expired" | "revoked" | "accepted";
};

export async function getInvitationByTokenHash({ tokenHash }: { tokenHash: string }): Promise<InvitationLookup | null> {
  const [row] = await db
    .select({
      id: invitations.id,
      workspaceId: invitations.workspaceId,
      workspaceName: workspaces.name,
      email: invitations.email,
      role: invitations.role,
      expiresAt: invitations.expiresAt,
      acceptedAt: invitations.acceptedAt,
      revokedAt: invitations.revokedAt,
    })
    .from(invitations)
    .innerJoin(workspaces, eq(workspaces.id, invitations.workspaceId))
    .where(eq(invitations.tokenHash, tokenHash));
  if (!row) return null;
  const state = row.acceptedAt
    ? "accepted"
    : row.revokedAt
      ? "revoked"
      : row.expiresAt.getTime() <= Date.now()
        ? "expired"
        : "pending";
  return {
    id: row.id,
    workspaceId: row.workspaceId,
    workspaceName: row.workspaceName,
    email: row.email,
    role: row.role,
    state,
  };
}

/**
 * Accepts a pending invitation for a user (existing, or created here with
 * `newUser`), in one transaction: the invitation can be used once only.
 */
export async function acceptInvitation(input: {
  invitationId: string;
  userId?: string;
  newUser?: { name: string; email: string; passwordHash: string };
}): Promise<{ userId: string; workspaceId: string }> {
  return db.transaction(async (tx) => {
    const [inv] = await tx
      .update(invitations)
      .set({ acceptedAt: new Date() })
      .where(
        and(
          eq(invitations.id, input.invitationId),
          isNull(invitations.acceptedAt),
          isNull(invitations.revokedAt),
          gt(invitations.expiresAt, new Date()),
        ),
      )
      .returning({ workspaceId: invitations.workspaceId, role: invitations.role });
    if (!inv) throw conflict("This invitation has already been used, revoked or has expired.");
    let userId = input.userId;
    if (!userId && input.newUser) {
      const [u] = await tx.insert(users).values(input.newUser).returning({ id: users.id });
      userId = u?.id;
    }
    if (!userId) throw new Error("acceptInvitation needs a user");
    await tx
      .insert(memberships)
      .values({ workspaceId: inv.workspaceId, userId, role: inv.role })
      .onConflictDoUpdate({ target: [memberships.workspaceId, memberships.userId], set: { role: inv.role } });
    return { userId, workspaceId: inv.workspaceId };
  });
}
