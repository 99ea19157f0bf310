import type { Decimal } from "decimal.js";
import { ZERO } from "./decimal";
import type { ParsedLine } from "./input";
import { makeWarning, type FormulationWarning } from "./warnings";

/** Result of pricing a recipe's ingredients. */
export type IngredientCost =
  | { ok: true; perKg: Decimal }
  | { ok: false; missing: ParsedLine[] };

/**
 * Ingredient cost per kg of recipe: Σ percent × pricePerKg ÷ Σ percent (currency per kg),
 * exact. Lines at 0 % need no price. Fails, listing them, when any other line lacks a price,
 * and when the recipe has no mass.
 */
export function ingredientCostPerKg(lines: readonly ParsedLine[]): IngredientCost {
  let total = ZERO;
  let money = ZERO;
  const missing: ParsedLine[] = [];
  for (const line of lines) {
    if (line.percent.isZero()) continue;
    total = total.plus(line.percent);
    if (line.pricePerKg === undefined) missing.push(line);
    else money = money.plus(line.percent.times(line.pricePerKg));
  }
  if (missing.length > 0 || total.isZero()) return { ok: false, missing };
  return { ok: true, perKg: money.div(total) };
}

/** A "missing-price" warning per line without a price. */
export function missingPriceWarnings(missing: readonly ParsedLine[]): FormulationWarning[] {
  return missing.map((line) =>
    makeWarning("missing-price", `${line.label} has no price per kg; the cost is left out.`, line.index),
  );
}
