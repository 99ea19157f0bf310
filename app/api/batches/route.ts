import { apiRoute } from "@/lib/api/route";
import { listBatches } from "@/lib/data/batches";
import { requireLot } from "@/lib/data/lots";
import { batchesUsingLot } from "@/lib/data/traceability";
import { batchListQuerySchema } from "@/lib/validation/batches";

/**
 * GET /api/batches — the workspace's batches (?status=planned|completed|cancelled);
 * with ?lotId= the recall answer instead: every batch whose run used that bean lot.
 */
export const GET = apiRoute({
  permission: "batches.read",
  schema: batchListQuerySchema,
  handler: async ({ input, viewer }) => {
    const workspaceId = viewer.workspace.id;
    if (input.lotId) {
      const lot = await requireLot({ workspaceId, lotId: input.lotId });
      return { lot: { id: lot.id, code: lot.code }, batches: await batchesUsingLot({ workspaceId, lotId: lot.id }) };
    }
    return { batches: await listBatches({ workspaceId, status: input.status }) };
  },
});
