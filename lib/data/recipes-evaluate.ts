import "server-only";
import {
  costRecipe,
  evaluateRecipe,
  summarizeStandards,
  type CostResult,
  type Evaluation,
  type IngredientSpec,
  type RecipeLine,
  type StandardSummary,
} from "@/lib/formulation";
import { toIngredientSpec } from "@/lib/recipes/engine-lines";
import type { EvaluateRequest } from "@/lib/validation/recipes";
import { invalid } from "@/lib/errors";
import { cachedLibrary } from "./library-cache";

/** The evaluation with each standards category in brief (the answer's default). */
export type EvaluationSummary = Omit<Evaluation, "standards"> & { standards: StandardSummary[] };

/**
 * The engine's output for a recipe sent to the API. Library ingredients are read
 * with today's profile and price (through library-cache.ts: at most a few
 * seconds old) (without the price when `prices` is false: for
 * those who may not see costs, who then get no cost either); inline ones are
 * taken as sent (already validated). Percents need not sum to 100: the engine
 * reads them as parts and warns. The standards come in brief unless the request
 * asks for `standards: "full"` (every check with its label, clause and source:
 * about four times the bytes, the same on every call).
 */
export async function evaluateRequest({
  workspaceId,
  request,
  on = new Date(),
  prices = true,
}: {
  workspaceId: string;
  request: EvaluateRequest;
  on?: Date;
  prices?: boolean;
}): Promise<{ evaluation: Evaluation | EvaluationSummary; cost?: CostResult }> {
  const ids = request.lines.flatMap((l) => ("ingredientId" in l ? [l.ingredientId] : []));
  const library = ids.length ? await cachedLibrary({ workspaceId, on }) : new Map();
  if (ids.some((id) => !library.has(id))) throw invalid("One of the ingredients is not in this workspace's library any more.", { lines: ["Unknown ingredient."] });
  const lines: RecipeLine[] = request.lines.map((l) => {
    const ingredient: IngredientSpec =
      "ingredientId" in l ? toIngredientSpec({ ...library.get(l.ingredientId)!, ...(prices ? {} : { pricePerKg: null }) }) : l.ingredient;
    return { ingredient, percent: l.percent };
  });
  const full = evaluateRecipe({ lines }, request.authorities ? { authorities: request.authorities } : undefined);
  const evaluation = request.standards === "full" ? full : { ...full, standards: summarizeStandards(full.standards) };
  return request.barMassGrams && prices ? { evaluation, cost: costRecipe(lines, { barMassGrams: request.barMassGrams }) } : { evaluation };
}
