import type { Decimal } from "decimal.js";
import { resolveCodexSettings, type ResolvedCodexSettings } from "./codex-settings";
import { Dec, HUNDRED, ONE, ZERO, describeInput, readDecimal, toDecimalString } from "./decimal";
import { parseLine, type ParsedLine } from "./input";
import { inclusionCap, limitConstraints, standardConstraints } from "./least-cost-rows";
import type { CategoryRef, LeastCostConstraintKind, LeastCostProblem } from "./least-cost-types";
import { readPercentResolution } from "./resolution";
import type { TargetDirection } from "./target-terms";
import type { FormulationWarning } from "./warnings";

/**
 * One constraint of the model, in the engine's exact units: with amount(x) = Σ amount[i] × x[i]
 * and mass(x) = Σ mass[i] × x[i] (x = line percents), the figure is amount(x) / mass(x) and the
 * constraint reads figure ≥, ≤, < or = bound. Because every mass is positive, that is the linear
 * row Σ (amount[i] − bound × mass[i]) × x[i] compared with 0 — the same cross-multiplied test
 * evaluateRecipe makes (standards.ts), so a Codex minimum m on dry matter becomes
 * Σ (q_i − m × dry_i) × x_i ≥ 0 and never a ratio.
 */
export interface ModelConstraint {
  readonly id: string;
  readonly kind: LeastCostConstraintKind;
  readonly label: string;
  readonly clause?: string;
  readonly amount: readonly Decimal[];
  readonly mass: readonly Decimal[];
  readonly bound: Decimal;
  readonly sense: "min" | "max" | "equal";
  /** A "less than" maximum: the bound itself fails. */
  readonly strict?: boolean;
  readonly unit: "%" | "per kg";
  /** For a target: which side the bench grid may land on (solveForTarget's defaultDirection). */
  readonly direction?: TargetDirection;
}

/** A line of the model with what the solver needs beside the engine's parsed line. */
export interface ModelLine {
  readonly parsed: ParsedLine;
  readonly name: string;
  readonly current: Decimal;
  readonly locked: boolean;
}

/** The whole problem, exact. */
export interface LeastCostModel {
  readonly lines: readonly ModelLine[];
  readonly constraints: readonly ModelConstraint[];
  readonly resolution: Decimal;
  readonly objective: { kind: "cost" } | { kind: "closest"; cap?: Decimal };
  readonly codex: ResolvedCodexSettings;
  /** The standards categories found, each once. */
  readonly categories: readonly CategoryRef[];
  readonly notes: string[];
}

/** The row coefficients of a constraint: amount[i] − bound × mass[i]. */
export function rowOf(constraint: ModelConstraint): Decimal[] {
  return constraint.amount.map((a, i) => a.minus(constraint.bound.times(constraint.mass[i]!)));
}

function readOptional(raw: unknown, what: string, notes: string[]): Decimal | undefined {
  const read = readDecimal(raw);
  if (read.ok) return read.value;
  if (read.problem !== "missing") notes.push(`${what} ${describeInput(raw)} is not a number; it is ignored.`);
  return undefined;
}

/** A constraint on one line's percent: amount 100 on the line, mass 1 on every line (Σ = 100). */
function lineConstraint(lines: readonly ModelLine[], i: number, kind: "line-min" | "line-max" | "lock", bound: Decimal): ModelConstraint {
  const line = lines[i]!;
  const b = toDecimalString(bound);
  const label = kind === "lock" ? `${line.name} locked at ${b} %` : `at ${kind === "line-min" ? "least" : "most"} ${b} % ${line.name}`;
  return {
    id: `${kind}:${i}`,
    kind,
    label,
    amount: lines.map((_, j) => (j === i ? HUNDRED : ZERO)),
    mass: lines.map(() => ONE),
    bound,
    sense: kind === "lock" ? "equal" : kind === "line-min" ? "min" : "max",
    unit: "%",
  };
}

function lineConstraints(problem: LeastCostProblem, lines: readonly ModelLine[], notes: string[]): ModelConstraint[] {
  const out: ModelConstraint[] = [];
  lines.forEach((line, i) => {
    if (line.locked) {
      out.push(lineConstraint(lines, i, "lock", line.current));
      return;
    }
    const raw = problem.lines[i];
    const min = readOptional(raw?.min, `${line.parsed.label}: the minimum`, notes);
    const max = readOptional(raw?.max, `${line.parsed.label}: the maximum`, notes);
    if (min !== undefined && min.gt(ZERO)) out.push(lineConstraint(lines, i, "line-min", min));
    if (max !== undefined && max.lt(HUNDRED)) out.push(lineConstraint(lines, i, "line-max", Dec.max(max, ZERO)));
  });
  return out;
}

function costCap(lines: readonly ModelLine[], cap: Decimal): ModelConstraint {
  return {
    id: "cost-cap",
    kind: "cost-cap",
    label: `ingredient cost at most ${toDecimalString(cap)} per kg`,
    amount: lines.map((line) => line.parsed.pricePerKg ?? ZERO),
    mass: lines.map(() => ONE),
    bound: cap,
    sense: "max",
    unit: "per kg",
  };
}

/**
 * Builds the exact model of a least-cost problem. Never throws: bad numbers are ignored (bounds)
 * or counted as 0 (percents), unknown categories are skipped, each with a note.
 */
export function buildLeastCostModel(problem: LeastCostProblem): LeastCostModel {
  const notes: string[] = [];
  const warnings: FormulationWarning[] = [];
  const rawLines = Array.isArray(problem?.lines) ? problem.lines : [];
  const lines: ModelLine[] = rawLines.map((raw, index) => {
    const parsed = parseLine(raw, index, warnings);
    const name = typeof raw?.ingredient?.name === "string" && raw.ingredient.name.trim() !== "" ? raw.ingredient.name : `line ${index + 1}`;
    return { parsed, name, current: parsed.percent, locked: raw?.locked === true };
  });
  const codex = resolveCodexSettings(problem?.codex, warnings);
  notes.push(...warnings.map((w) => w.message));
  const resolution = readPercentResolution(problem?.resolution, notes);
  const categories: CategoryRef[] = [];
  const constraints = [
    ...lineConstraints(problem, lines, notes),
    ...limitConstraints(lines, problem?.limits ?? [], notes),
    ...standardConstraints(lines, problem?.categories ?? [], codex, notes, categories),
  ];
  const onChocolateBasis =
    categories.some((c) => c.authority !== "US") || (Array.isArray(problem?.limits) && problem.limits.some((l) => l?.basis === "eu" || l?.basis === "codex"));
  if (onChocolateBasis && lines.some((line) => line.parsed.inclusion)) constraints.push(inclusionCap(lines));
  const given = problem?.objective;
  let objective: LeastCostModel["objective"] = { kind: "cost" };
  if (given?.kind === "closest") {
    const cap = readOptional(given.maxCostPerKg, "The cost ceiling", notes);
    objective = cap === undefined ? { kind: "closest" } : { kind: "closest", cap };
    if (cap !== undefined) constraints.push(costCap(lines, cap));
  }
  return { lines, constraints, resolution, objective, codex, categories, notes };
}
