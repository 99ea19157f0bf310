import Decimal from "decimal.js";
import { costRecipe, type Evaluation, type RecipeLine } from "@/lib/formulation";

/** The few figures a version is listed and sorted by. */
export type VersionFigures = {
  /** Total dry cocoa solids on the EU basis (inclusions deducted): the figure behind the label's cocoa %. */
  cocoaPercent: string;
  /** The EU "cocoa solids: X % minimum" figure (whole percent, rounded down by the engine). */
  labelCocoaPercent: string;
  costPerKg: string | null;
  costPerBar: string | null;
};

/**
 * Figures of an evaluated recipe. Cost per bar is the ingredient cost of one bar
 * (no loss, labour or packaging: those are not part of a recipe). Null when a
 * line has no price.
 */
export function versionFigures(evaluation: Evaluation, lines: RecipeLine[], barMassGrams: string): VersionFigures {
  const cost = costRecipe(lines, { barMassGrams });
  return {
    cocoaPercent: evaluation.bases.eu.totalDryCocoaSolids,
    labelCocoaPercent: evaluation.composition.cocoaSolidsStatement,
    costPerKg: cost.ok ? cost.ingredientCostPerKg : null,
    costPerBar: cost.ok ? cost.costPerBar : null,
  };
}

/** A figure rounded half up to the columns' four decimals, for storing copies used to sort. */
export function toStored(value: string | null): string | null {
  return value === null ? null : new Decimal(value).toDecimalPlaces(4, Decimal.ROUND_HALF_UP).toFixed(4);
}
