import { apiRoute } from "@/lib/api/route";
import { requireCostReader } from "@/lib/auth/costs";
import { listQuotes } from "@/lib/data/quotes";
import { isoDay } from "@/lib/pricing/convert";
import { quoteListQuerySchema } from "@/lib/validation/quotes";

/**
 * GET /api/quotes — every quote (history included), optionally one ingredient's or one supplier's.
 * Quotes are prices: 403 for a viewer who may not see costs (lib/auth/costs.ts).
 */
export const GET = apiRoute({
  permission: "ingredients.read",
  schema: quoteListQuerySchema,
  handler: async ({ input, viewer }) => {
    await requireCostReader(viewer);
    return listQuotes({ workspaceId: viewer.workspace.id, ...input, on: input.on ?? isoDay(new Date()) });
  },
});
