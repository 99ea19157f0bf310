import { apiRoute } from "@/lib/api/route";
import { canSeeCosts } from "@/lib/auth/costs";
import { evaluateRequest } from "@/lib/data/recipes-evaluate";
import { evaluateRequestSchema } from "@/lib/validation/recipes";

/**
 * POST /api/recipes/evaluate — the engine's evaluation of any recipe: lines name
 * a library ingredient (today's profile and price) or carry their own profile.
 * With barMassGrams, also the ingredient cost per kg and per bar. Library
 * prices and costs only for those who may see costs (lib/auth/costs.ts).
 * Standards come in brief — each category's pass and its failed checks — unless
 * the body says `standards: "full"` (every check with its label and clause).
 */
export const POST = apiRoute({
  permission: "recipes.read",
  schema: evaluateRequestSchema,
  handler: async ({ input, viewer }) => evaluateRequest({ workspaceId: viewer.workspace.id, request: input, prices: await canSeeCosts(viewer) }),
});
