import { z } from "zod";
import { apiRoute } from "@/lib/api/route";
import { listSuppliers } from "@/lib/data/suppliers";

const querySchema = z.object({ archived: z.enum(["include", "exclude", "only"]).optional().default("exclude") }).strict();

/** GET /api/suppliers — the workspace's suppliers with their quote counts. */
export const GET = apiRoute({
  permission: "ingredients.read",
  schema: querySchema,
  handler: async ({ input, viewer }) => ({ suppliers: await listSuppliers({ workspaceId: viewer.workspace.id, archived: input.archived }) }),
});
