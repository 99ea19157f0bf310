import { apiRoute } from "@/lib/api/route";
import { scalePlan } from "@/lib/data/batches-plan";
import { previewBatchSchema } from "@/lib/validation/batches";

/**
 * GET /api/batches/preview?recipeId&amount&unit&stationId[&machineId] — the
 * batch as it would be planned (the engine's masses and loads), nothing saved.
 */
export const GET = apiRoute({
  permission: "batches.plan",
  schema: previewBatchSchema,
  handler: async ({ input, viewer }) => {
    const plan = await scalePlan({ workspaceId: viewer.workspace.id, input });
    return {
      recipe: plan.recipe,
      versionNo: plan.version.versionNo,
      totalMassGrams: plan.totalMassGrams,
      requestedMassGrams: plan.requestedMassGrams,
      resolutionGrams: plan.station.resolutionGrams,
      lines: plan.lines,
      loads: plan.loads.map((l) => l.massGrams),
      notes: plan.notes,
    };
  },
});
