import type { Decimal } from "decimal.js";
import { HUNDRED, ZERO, describeInput, readDecimal, toDecimalString } from "./decimal";
import { COMPOSITION_FIELDS, type CompositionField } from "./quantities";
import { makeWarning, type FormulationWarning } from "./warnings";

/** One recipe line after validation: every figure a Decimal, every bad value replaced by 0. */
export interface ParsedLine {
  readonly index: number;
  /** The ingredient's name, or "line N" when it has none, for messages. */
  readonly label: string;
  /** Percent of the recipe, ≥ 0. */
  readonly percent: Decimal;
  readonly inclusion: boolean;
  /** Composition fields, g per 100 g, each ≥ 0. */
  readonly fields: Readonly<Record<CompositionField, Decimal>>;
  /** 100 − Σ fields, floored at 0, g per 100 g. */
  readonly other: Decimal;
  /** A cocoa ingredient for 21 CFR 163.123(a)(2): non-fat cocoa solids > 0 and not an inclusion. */
  readonly isCocoa: boolean;
  /** Price per kg, undefined when missing or invalid. */
  readonly pricePerKg: Decimal | undefined;
}

function isRecord(value: unknown): value is Record<string, unknown> {
  return typeof value === "object" && value !== null;
}

function readPercent(raw: unknown, where: string, index: number, warnings: FormulationWarning[]) {
  const read = readDecimal(raw);
  if (!read.ok) {
    const why = read.problem === "out-of-range" ? "is out of range" : "is not a number";
    warnings.push(makeWarning("invalid-percent", `${where}: percent ${describeInput(raw)} ${why}; counted as 0 %.`, index));
    return ZERO;
  }
  if (read.value.isNegative()) {
    warnings.push(makeWarning("negative-percent", `${where}: percent ${toDecimalString(read.value)} is negative; counted as 0 %.`, index));
    return ZERO;
  }
  return read.value;
}

function readField(
  ingredient: Record<string, unknown>,
  field: CompositionField,
  where: string,
  index: number,
  warnings: FormulationWarning[],
): Decimal {
  const raw = ingredient[field];
  const read = readDecimal(raw);
  if (!read.ok) {
    if (read.problem === "missing") return ZERO;
    warnings.push(makeWarning("invalid-composition", `${where}: ${field} ${describeInput(raw)} is not a valid number; counted as 0 g per 100 g.`, index));
    return ZERO;
  }
  if (read.value.isNegative()) {
    warnings.push(makeWarning("negative-composition", `${where}: ${field} ${toDecimalString(read.value)} is negative; counted as 0 g per 100 g.`, index));
    return ZERO;
  }
  return read.value;
}

function readPrice(raw: unknown, where: string, index: number, warnings: FormulationWarning[]) {
  const read = readDecimal(raw);
  if (read.ok && !read.value.isNegative()) return read.value;
  if (!read.ok && read.problem === "missing") return undefined;
  warnings.push(makeWarning("invalid-price", `${where}: price per kg ${describeInput(raw)} is not a valid non-negative number; treated as missing.`, index));
  return undefined;
}

/**
 * Validates one recipe line. Never throws: a non-object line or ingredient, a bad percent or a
 * bad field is replaced by 0 (and a missing name by "line N"), each with a warning. A composition
 * over 100 g per 100 g is kept as given, with a warning, and leaves "other" at 0.
 */
export function parseLine(raw: unknown, index: number, warnings: FormulationWarning[]): ParsedLine {
  const line = isRecord(raw) ? raw : {};
  if (!isRecord(raw)) {
    warnings.push(makeWarning("invalid-line", `line ${index + 1} is not a recipe line; counted as 0 %.`, index));
  }
  const ingredient = isRecord(line.ingredient) ? line.ingredient : {};
  const name = typeof ingredient.name === "string" && ingredient.name.trim() !== "" ? ingredient.name : "";
  const label = name === "" ? `line ${index + 1}` : `line ${index + 1} (${name})`;
  if (isRecord(raw) && !isRecord(line.ingredient)) {
    warnings.push(makeWarning("invalid-line", `${label} has no ingredient; its mass counts as "other".`, index));
  }
  const percent = isRecord(raw) ? readPercent(line.percent, label, index, warnings) : ZERO;
  const fields = {} as Record<CompositionField, Decimal>;
  let sum = ZERO;
  for (const field of COMPOSITION_FIELDS) {
    const value = readField(ingredient, field, label, index, warnings);
    fields[field] = value;
    if (!value.isZero()) sum = sum.plus(value);
  }
  if (sum.gt(HUNDRED)) {
    warnings.push(makeWarning("composition-over-100", `${label}: its composition adds up to ${toDecimalString(sum)} g per 100 g, more than 100 g.`, index));
  }
  const inclusion = ingredient.inclusion === true;
  return {
    index,
    label,
    percent,
    inclusion,
    fields,
    other: sum.gte(HUNDRED) ? ZERO : HUNDRED.minus(sum),
    isCocoa: !inclusion && fields.cocoaSolidsNonFat.gt(ZERO),
    pricePerKg: readPrice(ingredient.pricePerKg, label, index, warnings),
  };
}

/**
 * Validates a whole recipe `{ lines }`. A non-object recipe or non-array `lines` gives an
 * "invalid-recipe" warning and no lines.
 */
export function parseRecipeLines(recipe: unknown, warnings: FormulationWarning[]): ParsedLine[] {
  const lines = isRecord(recipe) ? recipe.lines : undefined;
  if (!Array.isArray(lines)) {
    warnings.push(makeWarning("invalid-recipe", "The recipe has no list of lines; nothing to evaluate."));
    return [];
  }
  return lines.map((line, index) => parseLine(line, index, warnings));
}

/**
 * Validates a list of lines that are used for their percents only (rebalance, scaling).
 * Returns one Decimal per line, ≥ 0, with bad values as 0 and a warning each.
 */
export function parsePercents(lines: unknown, warnings: FormulationWarning[]): Decimal[] {
  if (!Array.isArray(lines)) {
    warnings.push(makeWarning("invalid-recipe", "The lines are not a list; nothing to do."));
    return [];
  }
  return lines.map((line, index) => {
    if (!isRecord(line)) {
      warnings.push(makeWarning("invalid-line", `line ${index + 1} is not a line with a percent; counted as 0 %.`, index));
      return ZERO;
    }
    return readPercent(line.percent, `line ${index + 1}`, index, warnings);
  });
}
