import { apiRoute } from "@/lib/api/route";
import { listMembers } from "@/lib/data/memberships";
import { notFound } from "@/lib/errors";
import { emptySchema, idSchema } from "@/lib/validation/auth";

/** GET /api/members/:userId — one member of the active workspace; 404 for anyone else. */
export const GET = apiRoute({
  permission: "workspace.read",
  schema: emptySchema,
  handler: async ({ viewer, params }) => {
    const id = idSchema.safeParse(params.userId);
    const member = id.success
      ? (await listMembers({ workspaceId: viewer.workspace.id })).find((m) => m.userId === id.data)
      : undefined;
    if (!member) throw notFound("That member");
    return { member };
  },
});
