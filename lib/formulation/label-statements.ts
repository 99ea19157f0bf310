import { ZERO, readDecimal } from "./decimal";
import type { Evaluation } from "./evaluate";
import { ALLERGEN_RULES } from "./reference/allergens";

/**
 * The label's other statements: cocoa and milk solids (EU) and the allergen summary (EU and US).
 */

export interface SolidsStatements {
  /** "cocoa solids: 68 % minimum", or null for a product without non-fat cocoa solids (white). */
  cocoa: string | null;
  /** "milk solids: 20 % minimum", or null when there are no milk solids or no cocoa statement. */
  milk: string | null;
  clause: string;
}

/**
 * The EU solids statements of Directive 2000/36/EC Art. 3 (paragraph from memory) for chocolate
 * and milk chocolate categories, on the EU basis (product less inclusions), rounded down to a
 * whole percent so "minimum" holds. Cocoa solids come from evaluateRecipe's own
 * `composition.cocoaSolidsStatement`; milk solids from its EU-basis dry milk solids. White
 * chocolate (no non-fat cocoa solids) carries neither.
 */
export function solidsStatements(evaluation: Evaluation): SolidsStatements {
  const clause = "Directive 2000/36/EC Art. 3 (from memory — verify)";
  const eu = evaluation.bases.eu;
  const nonFat = readDecimal(eu.cocoaSolidsNonFat);
  if (!nonFat.ok || !nonFat.value.gt(ZERO)) return { cocoa: null, milk: null, clause };
  const cocoa = `cocoa solids: ${evaluation.composition.cocoaSolidsStatement} % minimum`;
  const milkSolids = readDecimal(eu.dryMilkSolids);
  const milk = milkSolids.ok && milkSolids.value.gt(ZERO) ? `milk solids: ${milkSolids.value.floor().toFixed(0)} % minimum` : null;
  return { cocoa, milk, clause };
}

/** One allergen present, with the ingredients that carry it. */
export interface AllergenPresence {
  code: string;
  /** "milk", "soya"… (EU) or "Milk", "Soy"… (US). */
  name: string;
  clause: string;
  ingredients: string[];
}

export interface AllergenSummary {
  /** Annex II substances present, in Annex II order. */
  eu: AllergenPresence[];
  /** US major food allergens present, in the same order. */
  us: AllergenPresence[];
  /** "Contains: Milk, Soy." or null when none (21 U.S.C. 343(w)(1)(A)). */
  usContains: string | null;
  /** Codes the rules do not know. */
  unknown: string[];
}

/** Which allergens the recipe's lines (with mass) carry, for the EU and the US. */
export function allergenSummary(lines: ReadonlyArray<{ name: string; percent: string | number; allergens: readonly string[] }>): AllergenSummary {
  const byCode = new Map<string, string[]>();
  for (const line of lines) {
    const p = readDecimal(line.percent);
    if (!p.ok || !p.value.gt(ZERO)) continue;
    for (const code of line.allergens) {
      const names = byCode.get(code) ?? [];
      if (!names.includes(line.name)) names.push(line.name);
      byCode.set(code, names);
    }
  }
  const eu: AllergenPresence[] = [];
  const us: AllergenPresence[] = [];
  for (const rule of ALLERGEN_RULES) {
    const ingredients = byCode.get(rule.code);
    if (!ingredients) continue;
    eu.push({ code: rule.code, name: rule.euWord, clause: rule.euClause, ingredients });
    const usIngredients = rule.usOnlyWith ? ingredients.filter((n) => rule.usOnlyWith!.some((w) => n.toLowerCase().includes(w))) : ingredients;
    if (rule.us && usIngredients.length > 0) us.push({ code: rule.code, name: usName(rule.us, rule.code, usIngredients), clause: "21 U.S.C. 321(qq); FASTER Act 2021 for sesame", ingredients: usIngredients });
  }
  const known = new Set(ALLERGEN_RULES.map((r) => r.code));
  return {
    eu,
    us,
    usContains: us.length > 0 ? `Contains: ${us.map((a) => a.name).join(", ")}.` : null,
    unknown: [...byCode.keys()].filter((c) => !known.has(c)),
  };
}

/** FALCPA wants the specific tree nut: "Tree nuts (hazelnut)" when the names show which. */
function usName(name: string, code: string, ingredients: string[]): string {
  if (code !== "nuts") return name;
  const rule = ALLERGEN_RULES.find((r) => r.code === code)!;
  const kinds = rule.keywords.filter((k) => ingredients.some((n) => n.toLowerCase().includes(k)));
  return kinds.length > 0 ? `${name} (${kinds.join(", ")})` : name;
}

