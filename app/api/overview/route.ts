import { apiRoute } from "@/lib/api/route";
import { getOverviewForViewer } from "@/lib/cost-visibility/overview";
import { isoDay } from "@/lib/pricing/convert";
import { overviewQuerySchema } from "@/lib/validation/overview";

/**
 * GET /api/overview?on=YYYY-MM-DD — what is waiting on the team: planned
 * batches (overdue ones first), open purchase orders, nibs and beans on hand,
 * and, by role, margins of released recipes at that day's quotes, recipes with
 * unreleased changes and supplier prices to chase (lib/cost-visibility/overview.ts).
 */
export const GET = apiRoute({
  permission: "workspace.read",
  schema: overviewQuerySchema,
  handler: async ({ input, viewer }) => getOverviewForViewer({ viewer, on: input.on ?? isoDay(new Date()) }),
});
