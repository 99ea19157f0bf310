import { z } from "zod";
import { apiRoute } from "@/lib/api/route";
import { routeId } from "@/lib/api/route-id";
import { getBatch } from "@/lib/data/batches";
import { lotsOfBatch } from "@/lib/data/traceability";

/** GET /api/batches/:batchId — the plan, its lines and loads, the run and the lots it used. */
export const GET = apiRoute({
  permission: "batches.read",
  schema: z.object({}).strict(),
  handler: async ({ viewer, params }) => {
    const workspaceId = viewer.workspace.id;
    const batch = await getBatch({ workspaceId, batchId: routeId(params.batchId, "That batch") });
    return { batch, lots: await lotsOfBatch({ workspaceId, batchId: batch.id }) };
  },
});
