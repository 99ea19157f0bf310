import type { Decimal } from "decimal.js";
import type { ResolvedCodexSettings } from "./codex-settings";
import { Dec, HUNDRED, ONE, describeInput, readDecimal, toDecimalString } from "./decimal";
import { sumRecipe, type RecipeSums } from "./composition";
import type { ModelConstraint, ModelLine } from "./least-cost-model";
import type { CategoryRef, CompositionLimit } from "./least-cost-types";
import { labelOf } from "./prepared-limits";
import { QUANTITY_LABELS, isQuantity, type Quantity } from "./quantities";
import { MAX_INCLUSIONS_PERCENT, STANDARD_CATEGORIES } from "./reference/standards";
import { defaultDirection } from "./solve-for-target";
import type { SolveBasis } from "./target-terms";

/**
 * What one percent of each line adds to every quantity and every basis mass, taken from the
 * engine's own sumRecipe (so the solver and evaluateRecipe count exactly alike: inclusions add to
 * no standards quantity, Codex dry matter deducts the line's moisture, US chocolate liquor is
 * 2.2 × the cocoa line less its cocoa butter…).
 */
function unitSums(lines: readonly ModelLine[]): RecipeSums[] {
  return lines.map((line) => sumRecipe([{ ...line.parsed, percent: ONE }]));
}

function amountOf(unit: RecipeSums, quantity: Quantity): Decimal {
  return quantity === "inclusions" ? unit.inclusions.times(HUNDRED) : unit.quantities[quantity];
}

function massOf(unit: RecipeSums, basis: SolveBasis): Decimal {
  return unit.baseMass[basis === "product" ? "us" : basis];
}

const BASIS_WORDS: Record<SolveBasis, string> = { product: "", eu: " (EU basis)", codex: " (Codex dry basis)", us: " (US basis)" };

function ratioConstraint(
  units: readonly RecipeSums[],
  quantity: Quantity,
  basis: SolveBasis,
  parts: Pick<ModelConstraint, "id" | "kind" | "label" | "clause" | "bound" | "sense" | "strict" | "direction">,
): ModelConstraint {
  return {
    ...parts,
    amount: units.map((unit) => amountOf(unit, quantity)),
    mass: units.map((unit) => massOf(unit, basis)),
    unit: "%",
  };
}

function readLimitValue(raw: unknown, what: string, notes: string[]): Decimal | undefined {
  const read = readDecimal(raw);
  if (read.ok) return read.value;
  if (read.problem !== "missing") notes.push(`${what} ${describeInput(raw)} is not a number; it is ignored.`);
  return undefined;
}

/** Targets and ranges on composition quantities. */
export function limitConstraints(lines: readonly ModelLine[], limits: readonly CompositionLimit[], notes: string[]): ModelConstraint[] {
  const units = unitSums(lines);
  const out: ModelConstraint[] = [];
  (Array.isArray(limits) ? limits : []).forEach((limit, k) => {
    const quantity = limit?.quantity;
    if (!isQuantity(quantity)) {
      notes.push(`${describeInput(quantity)} is not a composition quantity; that limit is ignored.`);
      return;
    }
    const basis: SolveBasis = limit.basis ?? "product";
    if (!(basis in BASIS_WORDS)) {
      notes.push(`${describeInput(basis)} is not a basis (product, eu, codex or us); that limit is ignored.`);
      return;
    }
    const name = QUANTITY_LABELS[quantity];
    const words = BASIS_WORDS[basis];
    const value = readLimitValue(limit.value, `The ${name} target`, notes);
    const min = readLimitValue(limit.min, `The ${name} minimum`, notes);
    const max = readLimitValue(limit.max, `The ${name} maximum`, notes);
    if (value !== undefined) {
      const label = `${name} at ${toDecimalString(value)} %${words}`;
      out.push(ratioConstraint(units, quantity, basis, { id: `target:${k}`, kind: "target", label, bound: value, sense: "equal", direction: defaultDirection(limit.quantity) }));
    }
    if (min !== undefined) {
      const label = `${name} ≥ ${toDecimalString(min)} %${words}`;
      out.push(ratioConstraint(units, quantity, basis, { id: `limit-min:${k}`, kind: "limit-min", label, bound: min, sense: "min" }));
    }
    if (max !== undefined) {
      const label = `${name} ≤ ${toDecimalString(max)} %${words}`;
      out.push(ratioConstraint(units, quantity, basis, { id: `limit-max:${k}`, kind: "limit-max", label, bound: max, sense: "max" }));
    }
  });
  return out;
}

/**
 * Every minimum and maximum of the chosen categories, straight from STANDARD_CATEGORIES (bounds,
 * bases, clauses) and the Codex settings.
 */
export function standardConstraints(
  lines: readonly ModelLine[],
  categories: readonly CategoryRef[],
  codex: ResolvedCodexSettings,
  notes: string[],
  chosen: CategoryRef[],
): ModelConstraint[] {
  const units = unitSums(lines);
  const out: ModelConstraint[] = [];
  for (const ref of Array.isArray(categories) ? categories : []) {
    const category = STANDARD_CATEGORIES.find((c) => c.authority === ref?.authority && c.category === ref?.category);
    if (category === undefined) {
      notes.push(`${describeInput(ref?.authority)} ${describeInput(ref?.category)} is not a standards category; it is ignored.`);
      continue;
    }
    if (chosen.some((c) => c.authority === category.authority && c.category === category.category)) continue;
    chosen.push({ authority: category.authority, category: category.category });
    category.limits.forEach((limit, k) => {
      const kind = limit.maximum !== undefined ? "maximum" : "minimum";
      const bound = limit.codexSetting !== undefined ? codex[limit.codexSetting] : new Dec((kind === "maximum" ? limit.maximum : limit.minimum) ?? "0");
      const label = `${category.authority} ${category.category}: ${labelOf(limit.quantity, kind, toDecimalString(bound), limit.exclusiveMaximum)}`;
      out.push(ratioConstraint(units, limit.quantity, limit.basis ?? category.basis, {
        id: `standard:${category.authority}:${category.category}:${k}`,
        kind: "standard",
        label,
        clause: limit.clause,
        bound,
        sense: kind === "maximum" ? "max" : "min",
        strict: limit.exclusiveMaximum === true ? true : undefined,
      }));
    });
  }
  return out;
}

/**
 * Inclusions ≤ 40 % of the product (Directive 2000/36/EC Annex I notes; Codex CXS 87-1981
 * section 2): the EU and Codex bases are defined for chocolate with at most that much added
 * foodstuff, and the ceiling keeps those bases from shrinking to nothing (a figure on an empty
 * basis means nothing and fails every check).
 */
export function inclusionCap(lines: readonly ModelLine[]): ModelConstraint {
  return ratioConstraint(unitSums(lines), "inclusions", "product", {
    id: "inclusions",
    kind: "inclusions",
    label: `inclusions ≤ ${MAX_INCLUSIONS_PERCENT} % of the product`,
    clause: "Directive 2000/36/EC Annex I notes; Codex CXS 87-1981 section 2",
    bound: new Dec(MAX_INCLUSIONS_PERCENT),
    sense: "max",
  });
}
