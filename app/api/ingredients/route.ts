import { apiRoute } from "@/lib/api/route";
import { listIngredientsForViewer } from "@/lib/cost-visibility/ingredients";
import { ingredientListQuerySchema } from "@/lib/validation/ingredients";

/**
 * GET /api/ingredients — the library, each with its preferred supplier's current price per kg
 * for those who may see costs (lib/auth/costs.ts); without prices (`pricesShown: false`) for the others.
 */
export const GET = apiRoute({
  permission: "ingredients.read",
  schema: ingredientListQuerySchema,
  handler: async ({ input, viewer }) => listIngredientsForViewer({ viewer, archived: input.archived }),
});
