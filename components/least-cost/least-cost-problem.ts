import { STANDARD_CATEGORIES, type CategoryRef, type LeastCostProblem, type RecipeLine } from "@/lib/formulation";
import type { ChocolateType } from "@/lib/recipes/types";

/** What the user sets in the panel. Percents are strings as typed ("" = none). */
export type LeastCostSettings = {
  categories: string[];
  targetMode: "none" | "exactly" | "atLeast";
  target: string;
  bounds: { min: string; max: string }[];
  objective: "cost" | "closest";
};

export const categoryKey = (c: CategoryRef) => `${c.authority}:${c.category}`;

/** The categories that fit a chocolate type, for the checkboxes. */
export function categoriesFor(type: ChocolateType): CategoryRef[] {
  const fits = (name: string) => (type === "white" ? name.includes("white") : type === "milk" ? name.includes("milk") : !name.includes("milk") && !name.includes("white"));
  return STANDARD_CATEGORIES.filter((c) => fits(c.category)).map((c) => ({ authority: c.authority, category: c.category }));
}

/** Checked at first: the plain EU and Codex category of the type. */
export function defaultCategories(type: ChocolateType): string[] {
  const name = type === "white" ? "white chocolate" : type === "milk" ? "milk chocolate" : "chocolate";
  return [`EU:${name}`, `Codex:${name}`];
}

/**
 * The engine's problem from the bench's lines (ingredient with today's price, percent, lock)
 * and the panel's settings. The target is the total dry cocoa solids on the EU basis — the
 * figure the EU "cocoa solids" statement uses.
 */
export function toProblem(lines: readonly RecipeLine[], locked: readonly boolean[], settings: LeastCostSettings, resolution: string): LeastCostProblem {
  const target = settings.target.trim();
  const limits: LeastCostProblem["limits"] =
    settings.targetMode === "none" || target === ""
      ? []
      : [{ quantity: "totalDryCocoaSolids", basis: "eu", ...(settings.targetMode === "exactly" ? { value: target } : { min: target }) }];
  return {
    lines: lines.map((line, i) => {
      const bound = settings.bounds[i];
      return {
        ingredient: line.ingredient,
        percent: line.percent,
        locked: locked[i] === true,
        ...(bound?.min.trim() ? { min: bound.min.trim() } : {}),
        ...(bound?.max.trim() ? { max: bound.max.trim() } : {}),
      };
    }),
    limits,
    categories: settings.categories.map((key) => {
      const [authority, ...rest] = key.split(":");
      return { authority: authority as CategoryRef["authority"], category: rest.join(":") };
    }),
    objective: { kind: settings.objective },
    resolution,
  };
}
