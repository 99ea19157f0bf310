/**
 * The allergens a label must emphasise or declare, by the short codes the ingredient library
 * uses (the same codes as lib/ingredients/allergens.ts).
 * - EU: Regulation (EU) No 1169/2011 Annex II (14 substances) and Art. 21(1)(b): emphasised in
 *   the ingredient list, e.g. in bold (primary).
 * - US: the nine major food allergens of FALCPA (21 U.S.C. 321(qq)), sesame added by the FASTER
 *   Act of 2021 (REFERENCE.md §4); declared in the list or in a "Contains" statement
 *   (21 U.S.C. 343(w)(1)). The "Contains" names follow FDA's examples (from memory).
 */
export interface AllergenRule {
  readonly code: string;
  /** Annex II point. */
  readonly euClause: string;
  /** Word added in brackets when the ingredient's name does not show the allergen. */
  readonly euWord: string;
  /** Parts of words that show the allergen in a name ("milk" also marks "buttermilk"). */
  readonly keywords: readonly string[];
  /** The US major food allergen, or null when it is not one (celery, mustard…). */
  readonly us: string | null;
  /** For cereals: only these words make it a US major allergen (wheat, not barley or rye). */
  readonly usOnlyWith?: readonly string[];
}

const annex = (point: number) => `Regulation (EU) No 1169/2011 Annex II point ${point}`;

export const ALLERGEN_RULES: readonly AllergenRule[] = [
  { code: "gluten", euClause: annex(1), euWord: "gluten", keywords: ["wheat", "rye", "barley", "oat", "spelt", "kamut", "gluten"], us: "Wheat", usOnlyWith: ["wheat", "spelt", "kamut"] },
  { code: "crustaceans", euClause: annex(2), euWord: "crustaceans", keywords: ["crustacean", "crab", "lobster", "prawn", "shrimp", "crayfish"], us: "Crustacean shellfish" },
  { code: "eggs", euClause: annex(3), euWord: "egg", keywords: ["egg"], us: "Egg" },
  { code: "fish", euClause: annex(4), euWord: "fish", keywords: ["fish"], us: "Fish" },
  { code: "peanuts", euClause: annex(5), euWord: "peanuts", keywords: ["peanut", "groundnut"], us: "Peanuts" },
  { code: "soybeans", euClause: annex(6), euWord: "soya", keywords: ["soy", "soja"], us: "Soy" },
  { code: "milk", euClause: annex(7), euWord: "milk", keywords: ["milk", "lactose", "whey", "cream", "cheese", "yoghurt", "yogurt", "casein"], us: "Milk" },
  {
    code: "nuts", euClause: annex(8), euWord: "nuts",
    keywords: ["almond", "hazelnut", "walnut", "cashew", "pecan", "brazil", "pistachio", "macadamia", "queensland"],
    us: "Tree nuts",
  },
  { code: "celery", euClause: annex(9), euWord: "celery", keywords: ["celery", "celeriac"], us: null },
  { code: "mustard", euClause: annex(10), euWord: "mustard", keywords: ["mustard"], us: null },
  { code: "sesame", euClause: annex(11), euWord: "sesame", keywords: ["sesame", "tahini"], us: "Sesame" },
  { code: "sulphites", euClause: annex(12), euWord: "sulphites", keywords: ["sulphite", "sulfite", "sulphur", "sulfur"], us: null },
  { code: "lupin", euClause: annex(13), euWord: "lupin", keywords: ["lupin"], us: null },
  { code: "molluscs", euClause: annex(14), euWord: "molluscs", keywords: ["mollusc", "mussel", "oyster", "squid", "clam", "scallop", "snail"], us: null },
];

/** The rule for an allergen code, or undefined for a code we do not know. */
export function findAllergenRule(code: string): AllergenRule | undefined {
  return ALLERGEN_RULES.find((rule) => rule.code === code);
}
