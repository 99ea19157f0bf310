import Decimal from "decimal.js";
import { evaluateRecipe, solveForTarget, type RecipeLine, type StandardCheck, type StandardResult } from "@/lib/formulation";

/** A change of two lines (one up, one down by the same amount) that makes a failing category pass. */
export type FixSuggestion = {
  adjustIndex: number;
  balanceIndex: number;
  from: string;
  to: string;
  balanceFrom: string;
  balanceTo: string;
  /** Every line's percent after the change. */
  percents: string[];
  /** False when the change fixes the failing figure but another check of the category still fails. */
  categoryPasses: boolean;
};

export type FixOutcome = { ok: true; fix: FixSuggestion } | { ok: false; reason: string };

// Only the smallest changes are re-checked in full: each check is an evaluation (one authority).
const VERIFIED_CANDIDATES = 24;

type Candidate = { adjustIndex: number; balanceIndex: number; percents: string[]; size: Decimal };

function targetOf(check: StandardCheck, resolution: string) {
  if (check.minimum !== undefined) return { value: check.minimum, direction: "atLeast" as const };
  // A strict maximum ("less than 12 %") is not met at the maximum itself: aim just below it.
  const max = new Decimal(check.maximum ?? "0");
  const value = check.exclusiveMaximum ? max.minus(new Decimal(resolution).div(100)).toFixed() : max.toFixed();
  return { value, direction: "atMost" as const };
}

function candidatesFor(lines: RecipeLine[], check: StandardCheck, locked: readonly boolean[], resolution: string): Candidate[] {
  const { value, direction } = targetOf(check, resolution);
  const out: Candidate[] = [];
  for (let a = 0; a < lines.length; a++) {
    for (let b = 0; b < lines.length; b++) {
      if (a === b || locked[a] || locked[b]) continue;
      const solved = solveForTarget(lines, { quantity: check.quantity, value, basis: check.basis }, a, b, { resolution, direction });
      if (!solved.ok) continue;
      const delta = new Decimal(solved.lines[a]!.percent).minus(new Decimal(String(lines[a]!.percent)));
      if (delta.isZero()) continue;
      // Told as "raise X, lower Y": the line that goes up is the one adjusted.
      const [up, down] = delta.isPositive() ? [a, b] : [b, a];
      out.push({ adjustIndex: up, balanceIndex: down, percents: solved.lines.map((l) => l.percent), size: delta.abs() });
    }
  }
  return out.sort((x, y) => x.size.cmp(y.size));
}

/** After the change: does the category pass, and how far did the cocoa figure (the label's headline) move? */
function after(lines: RecipeLine[], percents: string[], result: StandardResult, cocoaBefore: Decimal): { pass: boolean; cocoaShift: Decimal } {
  const moved = lines.map((line, i) => ({ ...line, percent: percents[i]! }));
  const e = evaluateRecipe({ lines: moved }, { authorities: [result.authority] });
  return {
    pass: e.standards.find((s) => s.category === result.category)?.pass ?? false,
    cocoaShift: new Decimal(e.composition.totalDryCocoaSolids).minus(cocoaBefore).abs(),
  };
}

/**
 * The smallest two-line change (solveForTarget: one line up, one down) after
 * which the whole category passes (among equals, the one that moves the total
 * dry cocoa solids least); failing that, the smallest change that meets one of
 * its failing limits. Locked lines never move. Pure; cost grows with lines².
 */
export function suggestFix(
  lines: RecipeLine[],
  result: StandardResult,
  options: { locked?: readonly boolean[]; resolution?: string } = {},
): FixOutcome {
  const locked = options.locked ?? [];
  const resolution = options.resolution ?? "0.1";
  const failing = result.checks.filter((c) => !c.pass);
  if (failing.length === 0) return { ok: false, reason: "This category is already met." };
  const seen = new Set<string>();
  const candidates = failing
    .flatMap((check) => candidatesFor(lines, check, locked, resolution))
    .filter((c) => !seen.has(c.percents.join()) && seen.add(c.percents.join()));
  if (candidates.length === 0) {
    return { ok: false, reason: "No change of two unlocked lines meets it: unlock a line or add an ingredient that carries what is missing." };
  }
  candidates.sort((x, y) => x.size.cmp(y.size));
  // Among equally small changes that pass, the one that moves the cocoa figure least.
  const cocoaBefore = new Decimal(evaluateRecipe({ lines }, { authorities: [] }).composition.totalDryCocoaSolids);
  let best: { candidate: Candidate; cocoaShift: Decimal } | undefined;
  for (const candidate of candidates.slice(0, VERIFIED_CANDIDATES)) {
    if (best && candidate.size.gt(best.candidate.size)) break;
    const checked = after(lines, candidate.percents, result, cocoaBefore);
    if (checked.pass && (!best || checked.cocoaShift.lt(best.cocoaShift))) best = { candidate, cocoaShift: checked.cocoaShift };
  }
  if (best) return { ok: true, fix: describe(lines, best.candidate, true) };
  return { ok: true, fix: describe(lines, candidates[0]!, false) };
}

function describe(lines: RecipeLine[], c: Candidate, categoryPasses: boolean): FixSuggestion {
  return {
    adjustIndex: c.adjustIndex,
    balanceIndex: c.balanceIndex,
    from: String(lines[c.adjustIndex]!.percent),
    to: c.percents[c.adjustIndex]!,
    balanceFrom: String(lines[c.balanceIndex]!.percent),
    balanceTo: c.percents[c.balanceIndex]!,
    percents: c.percents,
    categoryPasses,
  };
}
