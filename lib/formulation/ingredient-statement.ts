import type { Decimal } from "decimal.js";
import { ZERO, describeInput, readDecimal, toDecimalString } from "./decimal";
import { findAllergenRule, type AllergenRule } from "./reference/allergens";
import type { DecimalInput } from "./types";

/**
 * The ingredient list: every ingredient in descending order of mass at mixing (Regulation (EU)
 * No 1169/2011 Art. 18(1); 21 CFR 101.4(a)(1)), allergens emphasised in the EU style
 * (Art. 21(1)(b): set apart, here in bold), as segments the page renders.
 */

/** One recipe line for the list: the names it is listed by, its share and its allergen codes. */
export interface StatementLine {
  /** The EU name (legal or customary). */
  name: string;
  /** The US name when it differs. */
  usName?: string;
  percent: DecimalInput;
  allergens: readonly string[];
}

/** A piece of text; `emphasis` marks an allergen (bold on the label). */
export interface StatementSegment {
  text: string;
  emphasis?: true;
}

/** One ingredient as listed: lines of the same name are one ingredient (their masses add). */
export interface StatementItem {
  name: string;
  /** Percent of the recipe, all lines of this name together. */
  percent: string;
  allergens: string[];
  segments: StatementSegment[];
}

export interface IngredientStatement {
  /** EU order and names, allergens emphasised. */
  eu: StatementItem[];
  /** US order and names (plain: the US declares allergens in the "Contains" statement). */
  us: StatementItem[];
  warnings: string[];
}

const WORD = /(\p{L}+)/u;

/**
 * A name split into segments with every word showing one of the allergens emphasised
 * ("whole milk powder" → whole **milk** powder; "buttermilk" is emphasised whole). An allergen
 * the name does not show is added in brackets, emphasised: "lecithin (**soya**)".
 */
export function emphasiseAllergens(name: string, codes: readonly string[]): StatementSegment[] {
  const rules = codes.map(findAllergenRule).filter((r): r is AllergenRule => r !== undefined);
  const shown = new Set<string>();
  const segments: StatementSegment[] = [];
  for (const part of name.split(WORD)) {
    if (part === "") continue;
    const lower = part.toLowerCase();
    const hits = WORD.test(part) ? rules.filter((r) => r.keywords.some((k) => lower.includes(k))) : [];
    hits.forEach((r) => shown.add(r.code));
    segments.push(hits.length > 0 ? { text: part, emphasis: true } : { text: part });
  }
  const missing = rules.filter((r) => !shown.has(r.code));
  if (missing.length > 0) {
    segments.push({ text: " (" });
    missing.forEach((r, i) => {
      if (i > 0) segments.push({ text: ", " });
      segments.push({ text: r.euWord, emphasis: true });
    });
    segments.push({ text: ")" });
  }
  return merge(segments);
}

/** Joins neighbouring segments of the same kind. */
function merge(segments: StatementSegment[]): StatementSegment[] {
  const out: StatementSegment[] = [];
  for (const s of segments) {
    const last = out[out.length - 1];
    if (last && Boolean(last.emphasis) === Boolean(s.emphasis)) last.text += s.text;
    else out.push({ ...s });
  }
  return out;
}

interface Grouped { name: string; percent: Decimal; allergens: string[]; first: number }

/**
 * Lines grouped by name (case and surrounding spaces ignored) and sorted by mass, heaviest first.
 * Equal masses keep the order of their first line in the recipe (the regulations set no rule
 * for ties: our choice, so the list is stable). Lines of 0 % are left out.
 */
function order(lines: readonly StatementLine[], nameOf: (l: StatementLine) => string, warnings: string[]): Grouped[] {
  const groups = new Map<string, Grouped>();
  lines.forEach((line, index) => {
    const read = readDecimal(line.percent);
    if (!read.ok || read.value.isNegative()) {
      warnings.push(`${line.name}: percent ${describeInput(line.percent)} is not a number of at least 0; left out of the list.`);
      return;
    }
    if (read.value.isZero()) return;
    const name = nameOf(line).trim();
    const key = name.toLowerCase();
    const group = groups.get(key) ?? { name, percent: ZERO, allergens: [], first: index };
    group.percent = group.percent.plus(read.value);
    for (const code of line.allergens) if (!group.allergens.includes(code)) group.allergens.push(code);
    groups.set(key, group);
  });
  return [...groups.values()].sort((a, b) => b.percent.comparedTo(a.percent) || a.first - b.first);
}

/**
 * The EU and US ingredient lists of a recipe. Unknown allergen codes are kept on the item and
 * reported in `warnings` (they cannot be emphasised by rule). Never throws.
 */
export function buildIngredientStatement(lines: readonly StatementLine[]): IngredientStatement {
  const warnings: string[] = [];
  for (const line of lines) {
    for (const code of line.allergens) if (!findAllergenRule(code)) warnings.push(`${line.name}: unknown allergen code ${describeInput(code)}; check the ingredient.`);
  }
  const eu = order(lines, (l) => l.name, warnings).map((g) => ({
    name: g.name, percent: toDecimalString(g.percent), allergens: g.allergens, segments: emphasiseAllergens(g.name, g.allergens),
  }));
  const us = order(lines, (l) => l.usName ?? l.name, []).map((g) => ({
    name: g.name, percent: toDecimalString(g.percent), allergens: g.allergens, segments: [{ text: g.name }],
  }));
  return { eu, us, warnings };
}
