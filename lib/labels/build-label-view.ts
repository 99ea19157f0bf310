import {
  addedSugarsOf,
  allergenSummary,
  buildIngredientStatement,
  computeNutrition,
  euNutritionDeclaration,
  evaluateRecipe,
  findLabelNames,
  findLabelNutrients,
  nutritionForPortion,
  solidsStatements,
  usNutritionPanel,
  usServingSize,
  type AllergenSummary,
  type EuDeclarationRow,
  type LabelNutrients,
  type NutritionLine,
  type SolidsStatements,
  type StatementItem,
  type UsPanel,
} from "@/lib/formulation";
import { toRecipeLines } from "@/lib/recipes/engine-lines";
import type { VersionLine } from "@/lib/recipes/types";

/**
 * Everything a label shows, worked out from one saved version: the version's lines as saved
 * (composition, allergens), today's nutrient figures of the library (the version does not keep
 * them), and the recipe's label settings. Plain data, ready for server components and print.
 */

/** The library's nutrient columns for one ingredient (null = not known). */
export type LibraryNutrients = {
  referenceKey: string | null;
  fat: string | null;
  saturatedFat: string | null;
  carbohydrate: string | null;
  sugars: string | null;
  fibre: string | null;
  protein: string | null;
  salt: string | null;
};

export type LabelViewInput = {
  barMassGrams: string;
  lines: VersionLine[];
  library: ReadonlyMap<string, LibraryNutrients>;
  settings: { mayContain: string | null; piecesPerBar: number | null; euPortionGrams: string | null };
};

export type LabelView = {
  eu: { rows: EuDeclarationRow[]; portionGrams: string | null };
  us: { panel: UsPanel | null; problem: string | null; clauses: string[] };
  statement: { eu: StatementItem[]; us: StatementItem[] };
  allergens: AllergenSummary;
  solids: SolidsStatements;
  mayContain: string | null;
  /** Ingredients without a figure for some nutrients (counted as 0): the label is incomplete. */
  gaps: { ingredient: string; nutrients: string[] }[];
  /** Figures the library lacks, taken from the reference profile the ingredient came from. */
  fallbacks: { ingredient: string; nutrients: string[]; sources: string[] }[];
  warnings: string[];
};

const COLUMN_OF: Array<[keyof LabelNutrients, Exclude<keyof LibraryNutrients, "referenceKey">, string]> = [
  ["fat", "fat", "fat"],
  ["saturates", "saturatedFat", "saturates"],
  ["carbohydrateByDifference", "carbohydrate", "carbohydrate"],
  ["sugars", "sugars", "sugars"],
  ["fibre", "fibre", "fibre"],
  ["protein", "protein", "protein"],
  ["salt", "salt", "salt"],
];
const WORDS: Record<string, string> = Object.fromEntries(COLUMN_OF.map(([engine, , word]) => [engine, word]));

/** "Roasted hazelnuts" → "roasted hazelnuts" for the running list; "UHT cream" stays. */
const listName = (name: string) => (/^\p{Lu}\p{Ll}/u.test(name) ? name[0]!.toLowerCase() + name.slice(1) : name);

function nutritionLine(line: VersionLine, row: LibraryNutrients | undefined, fallbacks: LabelView["fallbacks"]): NutritionLine {
  const reference = row?.referenceKey ? findLabelNutrients(row.referenceKey) : undefined;
  const nutrients: NutritionLine["nutrients"] = {};
  const borrowed: string[] = [];
  for (const [engine, column, word] of COLUMN_OF) {
    const own = row?.[column] ?? null;
    const fallback = reference?.nutrients[engine];
    if (own !== null) nutrients[engine] = own;
    else if (fallback !== undefined) {
      nutrients[engine] = fallback;
      borrowed.push(word);
    }
  }
  if (borrowed.length > 0 && reference) fallbacks.push({ ingredient: line.name, nutrients: borrowed, sources: [...reference.sources] });
  const added = addedSugarsOf(line.sugar, nutrients.sugars === undefined ? undefined : String(nutrients.sugars));
  if (added !== undefined) nutrients.addedSugars = added;
  return { name: line.name, percent: line.percent, nutrients };
}

function gapsByIngredient(missing: ReturnType<typeof computeNutrition>["missing"]): LabelView["gaps"] {
  const by = new Map<string, string[]>();
  for (const m of missing) for (const name of m.lines) by.set(name, [...(by.get(name) ?? []), WORDS[m.nutrient] ?? m.nutrient]);
  return [...by].map(([ingredient, nutrients]) => ({ ingredient, nutrients }));
}

/** The label of one saved version (see the module comment). Pure; never throws on bad figures. */
export function buildLabelView(input: LabelViewInput): LabelView {
  const fallbacks: LabelView["fallbacks"] = [];
  const nutrition = computeNutrition(input.lines.map((l) => nutritionLine(l, input.library.get(l.ingredientId), fallbacks)));
  const portion = input.settings.euPortionGrams ? nutritionForPortion(nutrition.per100g, input.settings.euPortionGrams) : null;
  const serving = usServingSize({ packageGrams: input.barMassGrams, piecesPerPackage: input.settings.piecesPerBar });
  const statementLines = input.lines.map((l) => {
    const names = findLabelNames(input.library.get(l.ingredientId)?.referenceKey);
    return { name: names?.eu ?? listName(l.name), usName: names?.us ?? listName(l.name), percent: l.percent, allergens: l.allergens };
  });
  const statement = buildIngredientStatement(statementLines);
  const evaluation = evaluateRecipe({ lines: toRecipeLines(input.lines.map((l) => ({ profile: l, percent: l.percent }))) });
  return {
    eu: { rows: euNutritionDeclaration(nutrition.per100g, portion ?? undefined), portionGrams: portion ? input.settings.euPortionGrams : null },
    us: serving.ok ? { panel: usNutritionPanel(nutrition.per100g, serving), problem: null, clauses: serving.clauses } : { panel: null, problem: serving.reason, clauses: [] },
    statement: { eu: statement.eu, us: statement.us },
    allergens: allergenSummary(input.lines.map((l) => ({ name: l.name, percent: l.percent, allergens: l.allergens }))),
    solids: solidsStatements(evaluation),
    mayContain: input.settings.mayContain,
    gaps: gapsByIngredient(nutrition.missing),
    fallbacks,
    warnings: [...nutrition.warnings, ...statement.warnings],
  };
}
