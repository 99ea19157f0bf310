import type { Decimal } from "decimal.js";
import { ZERO, toDecimalString } from "./decimal";
import { PREPARED_CATEGORIES, SLOT_COUNT, labelOf, type PreparedLimit } from "./prepared-limits";
import type { StandardQuantity } from "./quantities";
import type { ResolvedCodexSettings } from "./codex-settings";
import type { Authority, Basis, SourceStatus } from "./types";

/** The outcome of one limit. Figures are decimal-string percentages of `basis`. */
export interface StandardCheck {
  quantity: StandardQuantity;
  basis: Basis;
  /** E.g. "total dry cocoa solids ≥ 35 %". */
  label: string;
  clause: string;
  status: SourceStatus;
  minimum?: string;
  maximum?: string;
  /** The maximum itself fails ("less than"). */
  exclusiveMaximum?: true;
  actual: string;
  pass: boolean;
  /** minimum − actual (as shown), on a failed minimum. */
  shortBy?: string;
  /** actual (as shown) − maximum, on a failed maximum ("0" when an exclusive maximum is hit exactly). */
  overBy?: string;
  note?: string;
}

/** The outcome of one category: passes when every check passes. */
export interface StandardResult {
  authority: Authority;
  category: string;
  reference: string;
  pass: boolean;
  checks: StandardCheck[];
}

/** A failed check without its wording: the figure, the limit and the gap. */
export type FailedCheck = Pick<StandardCheck, "quantity" | "basis" | "actual" | "minimum" | "maximum" | "exclusiveMaximum" | "shortBy" | "overBy">;

/**
 * A category's outcome in brief: pass or fail, and only the checks that failed, without the
 * wording (label, clause, source status, note) that is the same on every evaluation. Every
 * figure a passed check read is in the evaluation's `bases`.
 */
export interface StandardSummary {
  authority: Authority;
  category: string;
  reference: string;
  pass: boolean;
  failed: FailedCheck[];
}

/** The brief form of checkSources' results, in the same order. */
export function summarizeStandards(results: readonly StandardResult[]): StandardSummary[] {
  return results.map(({ authority, category, reference, pass, checks }) => ({
    authority,
    category,
    reference,
    pass,
    failed: checks
      .filter((c) => !c.pass)
      .map(({ quantity, basis, actual, minimum, maximum, exclusiveMaximum, shortBy, overBy }) => {
        const failed: FailedCheck = { quantity, basis, actual };
        if (minimum !== undefined) failed.minimum = minimum;
        if (maximum !== undefined) failed.maximum = maximum;
        if (exclusiveMaximum) failed.exclusiveMaximum = exclusiveMaximum;
        if (shortBy !== undefined) failed.shortBy = shortBy;
        if (overBy !== undefined) failed.overBy = overBy;
        return failed;
      }),
  }));
}

/**
 * What the checks read. `amount` and `mass` are exact and in the same units, so that the
 * percentage is amount / mass; `value` is that percentage as shown and `figure` its string.
 */
export interface CheckSource {
  amount(basis: Basis, quantity: StandardQuantity): Decimal;
  mass(basis: Basis): Decimal;
  value(basis: Basis, quantity: StandardQuantity): Decimal;
  figure(basis: Basis, quantity: StandardQuantity): string;
}

function checkOne(prepared: PreparedLimit, source: CheckSource, settings: ResolvedCodexSettings, scaledBounds: (Decimal | undefined)[]): StandardCheck {
  const { limit, kind, basis } = prepared;
  const amount = source.amount(basis, limit.quantity);
  const mass = source.mass(basis);
  const bound = prepared.bound ?? settings[limit.codexSetting!];
  const boundText = prepared.boundText ?? toDecimalString(bound);
  // Exact: amount ≥ bound × mass  ⇔  amount / mass ≥ bound when mass > 0; no division needed.
  let scaled = prepared.slot >= 0 ? scaledBounds[prepared.slot] : undefined;
  if (scaled === undefined) {
    scaled = bound.times(mass);
    if (prepared.slot >= 0) scaledBounds[prepared.slot] = scaled;
  }
  const hasMass = mass.gt(ZERO);
  const pass = hasMass && (kind === "minimum" ? amount.gte(scaled) : limit.exclusiveMaximum ? amount.lt(scaled) : amount.lte(scaled));
  const check: StandardCheck = {
    quantity: limit.quantity,
    basis,
    label: prepared.label ?? labelOf(limit.quantity, kind, boundText, limit.exclusiveMaximum),
    clause: limit.clause,
    status: limit.status,
    actual: source.figure(basis, limit.quantity),
    pass,
  };
  if (kind === "minimum") check.minimum = boundText;
  else check.maximum = boundText;
  if (limit.exclusiveMaximum) check.exclusiveMaximum = true;
  if (!pass && hasMass) {
    const shown = source.value(basis, limit.quantity);
    if (kind === "minimum") check.shortBy = toDecimalString(bound.minus(shown));
    else check.overBy = toDecimalString(shown.minus(bound));
  }
  if (limit.note !== undefined) check.note = limit.note;
  return check;
}

/**
 * Checks amounts against every category of the chosen authorities, in the order of
 * STANDARD_CATEGORIES (reference/standards.ts). Pass/fail compares exact cross-products: a
 * value exactly at a minimum passes, exactly at an exclusive maximum fails; no epsilon. A
 * basis with no mass fails every check on it.
 */
export function checkSources(source: CheckSource, authorities: ReadonlySet<Authority>, settings: ResolvedCodexSettings): StandardResult[] {
  const results: StandardResult[] = [];
  const scaledBounds = new Array<Decimal | undefined>(SLOT_COUNT);
  for (const { category, limits } of PREPARED_CATEGORIES) {
    if (!authorities.has(category.authority)) continue;
    const checks: StandardCheck[] = [];
    let pass = true;
    for (const prepared of limits) {
      const check = checkOne(prepared, source, settings, scaledBounds);
      pass = pass && check.pass;
      checks.push(check);
    }
    results.push({ authority: category.authority, category: category.category, reference: category.reference, pass, checks });
  }
  return results;
}
