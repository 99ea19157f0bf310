import { apiRoute } from "@/lib/api/route";
import { inviteMember } from "@/lib/auth/accounts";
import { listPendingInvitations } from "@/lib/data/invitations";
import { emptySchema, inviteSchema } from "@/lib/validation/auth";

/** GET /api/invitations — waiting invitations (owners). */
export const GET = apiRoute({
  permission: "members.manage",
  schema: emptySchema,
  handler: async ({ viewer }) => ({ invitations: await listPendingInvitations({ workspaceId: viewer.workspace.id }) }),
});

/** POST /api/invitations `{ email, role }` — invites someone by e-mail (owners). */
export const POST = apiRoute({
  permission: "members.manage",
  schema: inviteSchema,
  handler: async ({ viewer, input }) =>
    inviteMember({
      workspaceId: viewer.workspace.id,
      workspaceName: viewer.workspace.name,
      invitedBy: { id: viewer.user.id, name: viewer.user.name },
      email: input.email,
      role: input.role,
    }),
});
