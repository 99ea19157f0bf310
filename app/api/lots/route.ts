import { apiRoute } from "@/lib/api/route";
import { listLots } from "@/lib/data/lots";
import { emptySchema } from "@/lib/validation/auth";

/** GET /api/lots — the workspace's bean lots with yield chain and nib cost per kg (base currency). */
export const GET = apiRoute({
  permission: "lots.read",
  schema: emptySchema,
  handler: async ({ viewer }) => ({ lots: await listLots({ workspaceId: viewer.workspace.id }) }),
});
