import type { CodexOptions } from "./codex-settings";
import type { Evaluation } from "./evaluate";
import type { Quantity } from "./quantities";
import type { SolveBasis } from "./target-terms";
import type { Authority, DecimalInput, IngredientSpec } from "./types";

/**
 * One line of a least-cost problem: the ingredient (with its price per kg), its current percent
 * and the bench's limits on it. Percents are percent by mass of the recipe.
 */
export interface LeastCostLine {
  ingredient: IngredientSpec;
  /** The current percent (kept when locked; the reference for the "closest" objective). */
  percent: DecimalInput;
  /** Lowest percent allowed for this line. */
  min?: DecimalInput;
  /** Highest percent allowed for this line. */
  max?: DecimalInput;
  /** A locked line keeps its current percent. */
  locked?: boolean;
}

/**
 * A limit on a composition quantity as a percentage of a basis ("product" = the finished
 * product, or an authority's basis): `value` asks for exactly that figure (a target), `min` and
 * `max` for a range. Any combination may be given.
 */
export interface CompositionLimit {
  quantity: Quantity;
  basis?: SolveBasis;
  value?: DecimalInput;
  min?: DecimalInput;
  max?: DecimalInput;
}

/** A standards category by its authority and its name as in STANDARD_CATEGORIES ("chocolate"). */
export interface CategoryRef {
  authority: Authority;
  category: string;
}

/**
 * What to minimise: the ingredient cost per kg, or the distance from the current mix (the sum of
 * the absolute percent changes) among the mixes that cost no more than `maxCostPerKg` — by
 * default no more than the cheapest mix, i.e. the cheapest mix that changes the least.
 */
export type LeastCostObjective = { kind: "cost" } | { kind: "closest"; maxCostPerKg?: DecimalInput };

/** A least-cost problem. */
export interface LeastCostProblem {
  lines: LeastCostLine[];
  /** Targets and ranges on composition quantities. */
  limits?: CompositionLimit[];
  /** Standards categories whose every minimum and maximum the mix must meet. */
  categories?: CategoryRef[];
  /** Codex settings, as for evaluateRecipe. */
  codex?: CodexOptions;
  objective?: LeastCostObjective;
  /** Bench grid step in percent (default 0.1, must divide 100). */
  resolution?: DecimalInput;
}

/** Kinds of constraint, for grouping and wording. */
export type LeastCostConstraintKind =
  | "line-min"
  | "line-max"
  | "lock"
  | "target"
  | "limit-min"
  | "limit-max"
  | "standard"
  | "inclusions"
  | "cost-cap";

/** One constraint as shown to the user, evaluated at the proposed (rounded) mix. */
export interface LeastCostConstraintReport {
  id: string;
  kind: LeastCostConstraintKind;
  /** E.g. "EU chocolate: cocoa butter ≥ 18 %", "at most 0.5 % Soy lecithin". */
  label: string;
  clause?: string;
  /** "≥", "≤", "<" or "=". */
  relation: "≥" | "≤" | "<" | "=";
  bound: string;
  /** "%" of the constraint's basis, or "per kg" for the cost cap. */
  unit: "%" | "per kg";
  /** The figure at the proposed mix, exact (34 significant digits at most). */
  actual: string;
  pass: boolean;
  /** At its bound in the solver's optimum: this constraint is what holds the cost up. */
  binding: boolean;
  /** How far a failed constraint is from its bound, in its unit. */
  slippedBy?: string;
}

/** One line of the proposal. */
export interface LeastCostProposalLine {
  index: number;
  name: string;
  /** The proposed percent on the bench grid, a decimal string. */
  percent: string;
  /** The solver's unrounded percent (6 decimals). */
  optimalPercent: string;
  currentPercent: string;
  /** percent − current percent. */
  change: string;
}

/** How the unrounded optimum was brought onto the bench grid. */
export interface LeastCostRounding {
  resolution: string;
  /**
   * "grid": the best mix on the grid found by an integer search (every constraint re-checked
   * exactly); "nearest": plain largest-remainder rounding, used only when no grid mix meets
   * every constraint — then `slipped` lists what fails.
   */
  method: "grid" | "nearest";
  /** Ids of the constraints that the rounded mix fails, with how much (see constraints). */
  slipped: string[];
  notes: string[];
}

/** A solved problem: the proposal, its check by evaluateRecipe and every constraint's state. */
export interface LeastCostSolution {
  ok: true;
  lines: LeastCostProposalLine[];
  /** Ingredient cost per kg of the proposed mix (evaluateRecipe's figure). */
  costPerKg?: string;
  /** Ingredient cost per kg of the current mix, when every line is priced. */
  currentCostPerKg?: string;
  /** The unrounded optimum's cost per kg (6 decimals): no mix meeting everything costs less. */
  optimalCostPerKg: string;
  /** currentCostPerKg − costPerKg (positive: the proposal is cheaper). */
  saving?: string;
  constraints: LeastCostConstraintReport[];
  /** True when the proposal meets every constraint exactly and evaluateRecipe passes every chosen category. */
  verified: boolean;
  rounding: LeastCostRounding;
  /** evaluateRecipe's result for the proposed mix (the engine's own check). */
  evaluation: Evaluation;
  notes: string[];
}

/** A constraint named in an explanation. */
export interface ConflictMember {
  id: string;
  kind: LeastCostConstraintKind;
  label: string;
  clause?: string;
}

/** The outcome of solveLeastCost. */
export type LeastCostResult =
  | LeastCostSolution
  | { ok: false; kind: "infeasible"; message: string; conflict: ConflictMember[]; notes: string[] }
  | { ok: false; kind: "invalid"; message: string; notes: string[] };
