import { apiRoute } from "@/lib/api/route";
import { listMembers } from "@/lib/data/memberships";
import { emptySchema } from "@/lib/validation/auth";

/** GET /api/members — the people of the active workspace. */
export const GET = apiRoute({
  permission: "workspace.read",
  schema: emptySchema,
  handler: async ({ viewer }) => ({ members: await listMembers({ workspaceId: viewer.workspace.id }) }),
});
