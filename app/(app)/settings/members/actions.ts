"use server";

import { revalidatePath } from "next/cache";
import { defineAction, defineFormAction } from "@/lib/actions/define-action";
import { inviteMember } from "@/lib/auth/accounts";
import { endAllSessionsOf } from "@/lib/auth/session";
import { revokeInvitation } from "@/lib/data/invitations";
import { changeMemberRole, removeMember } from "@/lib/data/memberships";
import { changeRoleSchema, invitationIdSchema, inviteSchema, memberSchema } from "@/lib/validation/auth";

const PATH = "/settings/members";

export const inviteMemberAction = defineFormAction({
  schema: inviteSchema,
  permission: "members.manage",
  handler: async (input, viewer) => {
    await inviteMember({
      workspaceId: viewer.workspace.id,
      workspaceName: viewer.workspace.name,
      invitedBy: { id: viewer.user.id, name: viewer.user.name },
      email: input.email,
      role: input.role,
    });
    revalidatePath(PATH);
    return { email: input.email };
  },
});

export const revokeInvitationAction = defineAction({
  schema: invitationIdSchema,
  permission: "members.manage",
  handler: async (input, viewer) => {
    await revokeInvitation({ workspaceId: viewer.workspace.id, invitationId: input.invitationId });
    revalidatePath(PATH);
  },
});

export const changeRoleAction = defineAction({
  schema: changeRoleSchema,
  permission: "members.manage",
  handler: async (input, viewer) => {
    await changeMemberRole({ workspaceId: viewer.workspace.id, userId: input.userId, role: input.role });
    revalidatePath(PATH);
  },
});

/** Removes a member and ends all of their sessions. */
export const removeMemberAction = defineAction({
  schema: memberSchema,
  permission: "members.manage",
  handler: async (input, viewer) => {
    await removeMember({ workspaceId: viewer.workspace.id, userId: input.userId });
    await endAllSessionsOf(input.userId);
    revalidatePath(PATH);
  },
});
