import { apiRoute } from "@/lib/api/route";
import { listQuotes } from "@/lib/data/quotes";
import { isoDay } from "@/lib/pricing/convert";
import { quoteListQuerySchema } from "@/lib/validation/quotes";

/** GET /api/quotes — every quote (history included), optionally one ingredient's or one supplier's. */
export const GET = apiRoute({
  permission: "ingredients.read",
  schema: quoteListQuerySchema,
  handler: async ({ input, viewer }) =>
    listQuotes({ workspaceId: viewer.workspace.id, ...input, on: input.on ?? isoDay(new Date()) }),
});
