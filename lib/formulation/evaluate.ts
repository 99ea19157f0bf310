import { Dec, HUNDRED, ZERO, toDecimalString } from "./decimal";
import { sumRecipe, type RecipeSums } from "./composition";
import { ingredientCostPerKg, missingPriceWarnings, type IngredientCost } from "./cost-per-kg";
import { resolveEvaluateOptions, type EvaluateOptions } from "./evaluate-options";
import { baseValues, compositionFigures, type BaseFigures, type CompositionFigures } from "./figures";
import { parseRecipeLines, type ParsedLine } from "./input";
import { MAX_INCLUSIONS_PERCENT } from "./reference/standards";
import { checkSources, type CheckSource, type StandardResult } from "./standards";
import type { Basis, Recipe } from "./types";
import { makeWarning, type FormulationWarning } from "./warnings";

/** Everything the bench shows for one recipe. */
export interface Evaluation {
  /** Percent of the finished product (the lines' total, taken as parts by mass). */
  composition: CompositionFigures;
  /** The standards' quantities on each authority's basis. */
  bases: Record<Basis, BaseFigures>;
  /** One entry per category per chosen authority. */
  standards: StandardResult[];
  /** Ingredient cost per kg of chocolate, when every line with mass has a price. */
  costPerKg?: string;
  warnings: FormulationWarning[];
}

const MAX_INCLUSIONS = new Dec(MAX_INCLUSIONS_PERCENT);

function recipeWarnings(lines: readonly ParsedLine[], sums: RecipeSums, cost: IngredientCost, warnings: FormulationWarning[]): void {
  if (sums.total.isZero()) {
    warnings.push(makeWarning("empty-recipe", "The recipe has no mass: add lines with a percent above 0."));
    return;
  }
  if (!sums.total.eq(HUNDRED)) {
    warnings.push(makeWarning("sum-not-100", `The lines add up to ${toDecimalString(sums.total)} %, not 100 %; figures are shares of that total.`));
  }
  if (sums.inclusions.times(HUNDRED).gt(MAX_INCLUSIONS.times(sums.total))) {
    const share = toDecimalString(sums.inclusions.times(HUNDRED).div(sums.total));
    warnings.push(makeWarning("inclusions-over-40", `Inclusions make up ${share} % of the product; the standards allow at most 40 % (Directive 2000/36/EC Annex I notes; Codex CXS 87-1981 section 2).`));
  }
  if (!sums.baseMass.eu.gt(ZERO)) {
    warnings.push(makeWarning("empty-base", "Only inclusions have mass: the EU and Codex figures are 0."));
  } else if (!sums.baseMass.codex.gt(ZERO)) {
    warnings.push(makeWarning("empty-base", "The chocolate part has no dry matter: the Codex figures are 0."));
  }
  // Only when some lines are priced: an unpriced recipe is normal, a half-priced one a mistake.
  if (!cost.ok && lines.some((line) => !line.percent.isZero() && line.pricePerKg !== undefined)) {
    warnings.push(...missingPriceWarnings(cost.missing));
  }
}

/**
 * Evaluates a recipe: composition of the finished product, the same quantities on the EU,
 * Codex and US bases, every category of the chosen authorities, the ingredient cost per kg and
 * warnings. Pure and deterministic; never throws and never returns NaN or Infinity: a bad
 * value counts as 0 and is reported in `warnings`. Percents that do not sum to 100 are read as
 * parts by mass (figures are shares of their total). All figures are decimal strings (see
 * toDecimalString); pass/fail is decided by exact decimal comparison.
 */
export function evaluateRecipe(recipe: Recipe, options?: EvaluateOptions): Evaluation {
  const warnings: FormulationWarning[] = [];
  const resolved = resolveEvaluateOptions(options, warnings);
  const lines = parseRecipeLines(recipe, warnings);
  const sums = sumRecipe(lines);
  const cost = ingredientCostPerKg(lines);
  recipeWarnings(lines, sums, cost, warnings);
  const values = { eu: baseValues(sums, "eu"), codex: baseValues(sums, "codex"), us: baseValues(sums, "us") };
  const source: CheckSource = {
    amount: (_basis, quantity) => sums.quantities[quantity],
    mass: (basis) => sums.baseMass[basis],
    value: (basis, quantity) => values[basis].values[quantity],
    figure: (basis, quantity) => values[basis].figures[quantity],
  };
  const bases: Record<Basis, BaseFigures> = { eu: values.eu.figures, codex: values.codex.figures, us: values.us.figures };
  const evaluation: Evaluation = {
    composition: compositionFigures(sums, bases.us),
    bases,
    standards: checkSources(source, resolved.authorities, resolved.codex),
    warnings,
  };
  if (cost.ok) evaluation.costPerKg = toDecimalString(cost.perKg);
  return evaluation;
}
