import "server-only";
import { loadLpSolver, solveLeastCost, type CompositionLimit, type LeastCostResult } from "@/lib/formulation";
import { loadBenchIngredients } from "@/lib/data/recipes-ingredients";
import { toIngredientSpec } from "@/lib/recipes/engine-lines";
import type { LeastCostRequest } from "@/lib/validation/least-cost";

/**
 * The least-cost mix of library ingredients at today's prices (the preferred supplier's quote,
 * in base currency), solved on the server with the same engine the bench runs in the browser.
 */
export async function solveLeastCostRequest({
  workspaceId,
  request,
  on = new Date(),
}: {
  workspaceId: string;
  request: LeastCostRequest;
  on?: Date;
}): Promise<LeastCostResult> {
  const library = await loadBenchIngredients({ workspaceId, ingredientIds: request.lines.map((l) => l.ingredientId), on });
  const solver = await loadLpSolver();
  return solveLeastCost(solver, {
    lines: request.lines.map((l) => ({
      ingredient: toIngredientSpec(library.get(l.ingredientId)!),
      percent: l.percent,
      min: l.min,
      max: l.max,
      locked: l.locked,
    })),
    limits: request.limits as CompositionLimit[] | undefined,
    categories: request.categories,
    objective: request.objective === "closest" ? { kind: "closest", maxCostPerKg: request.maxCostPerKg } : { kind: "cost" },
    resolution: request.resolution,
  });
}
