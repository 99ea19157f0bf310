import { apiRoute } from "@/lib/api/route";
import { listIngredients } from "@/lib/data/ingredients";
import { getCurrentPrices } from "@/lib/data/prices";
import { isoDay } from "@/lib/pricing/convert";
import { ingredientListQuerySchema } from "@/lib/validation/ingredients";

/** GET /api/ingredients — the library, each with its preferred supplier's current price per kg. */
export const GET = apiRoute({
  permission: "ingredients.read",
  schema: ingredientListQuerySchema,
  handler: async ({ input, viewer }) => {
    const workspaceId = viewer.workspace.id;
    const list = await listIngredients({ workspaceId, archived: input.archived });
    const prices = await getCurrentPrices({ workspaceId, ingredientIds: list.map((i) => i.id), on: isoDay(new Date()) });
    return { ingredients: list.map((i) => ({ ...i, currentPrice: prices[i.id] ?? null })) };
  },
});
