import type { IngredientSpec, RecipeLine } from "@/lib/formulation";
import { PROFILE_FIELDS, type IngredientProfile } from "./types";

/** An ingredient profile in the engine's shape (missing price = no price). */
export function toIngredientSpec(profile: IngredientProfile): IngredientSpec {
  const spec: IngredientSpec = { name: profile.name, inclusion: profile.isInclusion };
  for (const field of PROFILE_FIELDS) spec[field] = profile[field];
  if (profile.pricePerKg !== null) spec.pricePerKg = profile.pricePerKg;
  return spec;
}

/** Recipe lines for the engine from (profile, percent) pairs. */
export function toRecipeLines(lines: ReadonlyArray<{ profile: IngredientProfile; percent: string }>): RecipeLine[] {
  return lines.map((line) => ({ ingredient: toIngredientSpec(line.profile), percent: line.percent }));
}
