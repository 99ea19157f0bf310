import type { Decimal } from "decimal.js";
import { ONE, ZERO, describeInput, readDecimal, toDecimalString } from "./decimal";
import { resolveEvaluateOptions, type EvaluateOptions } from "./evaluate-options";
import type { StandardQuantity } from "./quantities";
import { checkSources, type StandardResult } from "./standards";
import type { Basis, DecimalInput } from "./types";
import { makeWarning, type FormulationWarning } from "./warnings";

/** Percentages already computed on each basis; a missing figure counts as 0. */
export type StandardFigures = Partial<Record<Basis, Partial<Record<StandardQuantity, DecimalInput>>>>;

/**
 * Checks figures that are already percentages of each basis (for example from a lab analysis,
 * or to test a limit directly) against every category of the chosen authorities. Same rules
 * and exact comparisons as evaluateRecipe. A figure that is not a number counts as 0, with a
 * warning.
 */
export function checkStandards(
  figures: StandardFigures,
  options?: EvaluateOptions,
): { standards: StandardResult[]; warnings: FormulationWarning[] } {
  const warnings: FormulationWarning[] = [];
  const resolved = resolveEvaluateOptions(options, warnings);
  const cache = new Map<string, Decimal>();
  const amount = (basis: Basis, quantity: StandardQuantity): Decimal => {
    const key = `${basis}.${quantity}`;
    const known = cache.get(key);
    if (known !== undefined) return known;
    const raw = typeof figures === "object" && figures !== null ? figures[basis]?.[quantity] : undefined;
    const read = readDecimal(raw);
    if (!read.ok && read.problem !== "missing") {
      warnings.push(makeWarning("invalid-composition", `Figure ${key} ${describeInput(raw)} is not a number; counted as 0.`));
    }
    const value = read.ok ? read.value : ZERO;
    cache.set(key, value);
    return value;
  };
  const standards = checkSources(
    { amount, mass: () => ONE, value: amount, figure: (basis, quantity) => toDecimalString(amount(basis, quantity)) },
    resolved.authorities,
    resolved.codex,
  );
  return { standards, warnings };
}
