import { z } from "zod";
import { apiRoute } from "@/lib/api/route";
import { requireCostReader } from "@/lib/auth/costs";
import { getCurrentPrices } from "@/lib/data/prices";
import { isoDay } from "@/lib/pricing/convert";
import { isoDaySchema } from "@/lib/validation/decimal";

const querySchema = z
  .object({
    // Comma-separated ingredient ids (up to 200).
    ingredientIds: z
      .string()
      .transform((s) => s.split(",").filter(Boolean))
      .pipe(z.array(z.string().uuid("Unknown ingredient.")).min(1, "Ask for at least one ingredient.").max(200, "Ask for at most 200 ingredients.")),
    on: isoDaySchema.optional(),
  })
  .strict();

/**
 * GET /api/prices/current?ingredientIds=a,b&on=YYYY-MM-DD — preferred suppliers' current prices per kg in base currency;
 * 403 for a viewer who may not see costs.
 */
export const GET = apiRoute({
  permission: "ingredients.read",
  schema: querySchema,
  handler: async ({ input, viewer }) => {
    await requireCostReader(viewer);
    return { prices: await getCurrentPrices({ workspaceId: viewer.workspace.id, ingredientIds: input.ingredientIds, on: input.on ?? isoDay(new Date()) }) };
  },
});
