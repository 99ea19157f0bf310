/**
 * The cost of a recipe version for one combination of sources: the engine's
 * costRecipe for the cost per kg, bar and case, and its priceAtMargin /
 * marginAtPrice for the selling side. No arithmetic of its own. Pure.
 */
import { costRecipe, marginAtPrice, priceAtMargin, type CostResult, type MoneyResult, type RecipeLine } from "@/lib/formulation";
import { toCostOptions } from "./settings";
import type { Choice, CostLine, CostSettings } from "./types";

export type Margins = {
  /** Selling price per bar giving the target margin (null without a target). */
  wholesalePriceAtTarget: MoneyResult | null;
  retailPriceAtTarget: MoneyResult | null;
  /** Gross margin, percent of the price, at the selling price entered (null without a price). */
  wholesaleMargin: MoneyResult | null;
  retailMargin: MoneyResult | null;
};

export type CombinationCost = { cost: CostResult; margins: Margins | null };

/** Engine lines priced by the choices (a choice without a price leaves the line unpriced). */
export function pricedLines(lines: readonly CostLine[], choices: readonly Choice[]): RecipeLine[] {
  const byIngredient = new Map(choices.map((c) => [c.ingredientId, c.perKg]));
  return lines.map((line) => {
    const perKg = byIngredient.get(line.ingredientId);
    return { ingredient: perKg ? { ...line.spec, pricePerKg: perKg } : { ...line.spec }, percent: line.percent };
  });
}

/** Target prices and margins for a cost per bar. */
export function marginsFor(costPerBar: string, settings: CostSettings): Margins {
  const at = (margin: string | null) => (margin === null ? null : priceAtMargin(costPerBar, margin));
  const of = (price: string | null) => (price === null ? null : marginAtPrice(costPerBar, price));
  return {
    wholesalePriceAtTarget: at(settings.wholesaleMarginPercent),
    retailPriceAtTarget: at(settings.retailMarginPercent),
    wholesaleMargin: of(settings.wholesalePricePerBar),
    retailMargin: of(settings.retailPricePerBar),
  };
}

/** Cost per kg, bar and case, and margins, of the version with these choices. */
export function costCombination(lines: readonly CostLine[], choices: readonly Choice[], settings: CostSettings, barMassGrams: string): CombinationCost {
  const cost = costRecipe(pricedLines(lines, choices), toCostOptions(settings, barMassGrams));
  return { cost, margins: cost.ok ? marginsFor(cost.costPerBar, settings) : null };
}

/** The choices with one ingredient priced differently (a swap or a what-if), the rest unchanged. */
export function withPrice(choices: readonly Choice[], ingredientId: string, key: string | null, perKg: string | null): Choice[] {
  return choices.map((c) => (c.ingredientId === ingredientId ? { ...c, key, perKg, note: null } : c));
}
