"use client";

import { memo, useMemo, useState } from "react";
import { Button } from "@/components/ui/button";
import { Card, CardHeader } from "@/components/ui/card";
import { solveLeastCost, type IngredientSpec, type LeastCostResult, type RecipeLine } from "@/lib/formulation";
import type { ChocolateType } from "@/lib/recipes/types";
import { LeastCostBounds } from "./least-cost-bounds";
import { categoriesFor, defaultCategories, toProblem, type LeastCostSettings } from "./least-cost-problem";
import { LeastCostResultView } from "./least-cost-result";
import { LeastCostSettingsForm } from "./least-cost-settings";
import { useLpSolver } from "./use-lp-solver";

export type LeastCostPanelProps = {
  /** The lines' ingredients, in order, with today's price per kg (stable while only percents move). */
  ingredients: readonly IngredientSpec[];
  /** The bench's locks, one per line. */
  locked: readonly boolean[];
  /** The bench's lines and locks as they are now; read only when solving. */
  read: () => { lines: RecipeLine[]; locked: readonly boolean[] };
  chocolateType: ChocolateType;
  /** The recipe's cocoa target, e.g. "70". */
  target: string | null;
  currency: string;
  /** Bench grid step in percent. */
  resolution: string;
  /** Receives the proposed percents, one per line, to become the unsaved draft. */
  onApply: (percents: string[]) => void;
};

/**
 * The least-cost mix: the cheapest recipe of the bench's ingredients that meets the chosen
 * standards, the cocoa target and each line's bounds, solved in the browser (HiGHS) by the
 * engine's solveLeastCost. Applying only changes the draft; the bench's save makes a version.
 * Memoised, and it reads the lines' percents only when it solves: moving a slider on the bench
 * leaves it alone (a shown proposal keeps the mix it was solved from in its "Now" column).
 */
export const LeastCostPanel = memo(function LeastCostPanel({ ingredients, locked, read, chocolateType, target, currency, resolution, onApply }: LeastCostPanelProps) {
  const solver = useLpSolver();
  const categories = useMemo(() => categoriesFor(chocolateType), [chocolateType]);
  const [settings, setSettings] = useState<LeastCostSettings>(() => ({
    categories: defaultCategories(chocolateType),
    targetMode: target ? "atLeast" : "none",
    target: target ?? "",
    bounds: ingredients.map(() => ({ min: "", max: "" })),
    objective: "cost",
  }));
  const [result, setResult] = useState<LeastCostResult | null>(null);
  const decimals = resolution.split(".")[1]?.length ?? 0;
  // Lines added or removed on the bench get empty bounds.
  const bounds = ingredients.map((_, i) => settings.bounds[i] ?? { min: "", max: "" });
  const chosen = settings.categories.map((key) => categories.find((c) => `${c.authority}:${c.category}` === key)).filter((c) => c !== undefined);

  function solve(next: LeastCostSettings) {
    if (solver.status !== "ready") return;
    const started = performance.now();
    const now = read();
    const outcome = solveLeastCost(solver.solver, toProblem(now.lines, now.locked, { ...next, bounds: now.lines.map((_, i) => next.bounds[i] ?? { min: "", max: "" }) }, resolution));
    // A User Timing entry: the browser's profiler and `npm run bench:optimizer` read the solve time.
    performance.measure("least-cost:solve", { start: started, end: performance.now() });
    setResult(outcome);
  }

  // Once a proposal is shown it follows every change of a bound or setting (a solve takes a few ms).
  function update(next: LeastCostSettings) {
    setSettings(next);
    if (result !== null) solve(next);
  }

  return (
    <Card data-testid="least-cost-panel" className="@container">
      <CardHeader title="Least-cost mix" description="The cheapest mix of these ingredients at today's prices that still meets the standards and your target." />
      <div className="space-y-4">
        <LeastCostSettingsForm settings={{ ...settings, bounds }} categories={categories} onChange={update} />
        <LeastCostBounds ingredients={ingredients} locked={locked} bounds={bounds} onChange={(b) => update({ ...settings, bounds: b })} />
        <div className="flex items-center gap-3">
          <Button onClick={() => solve(settings)} disabled={solver.status !== "ready" || ingredients.length === 0}>
            Find least-cost mix
          </Button>
          {solver.status === "loading" ? <span className="text-sm text-cocoa-500">Loading the solver…</span> : null}
          {solver.status === "failed" ? <span className="text-sm text-brick">{solver.message}</span> : null}
        </div>
        {result ? (
          <LeastCostResultView
            result={result}
            categories={chosen}
            currency={currency}
            decimals={decimals}
            onApply={(percents) => {
              onApply(percents);
              setResult(null);
            }}
          />
        ) : null}
      </div>
    </Card>
  );
});
