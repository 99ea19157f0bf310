"use client";

import { memo, useState } from "react";
import { Button } from "@/components/ui/button";
import { Card, CardHeader } from "@/components/ui/card";
import { Field } from "@/components/ui/field";
import { NumberField } from "@/components/ui/number-field";
import { Select } from "@/components/ui/select";
import { QUANTITIES, QUANTITY_LABELS, solveForTarget, type IngredientSpec, type Quantity, type RecipeLine, type SolveBasis } from "@/lib/formulation";
import { pct } from "@/lib/recipes/format";
import type { ChocolateType } from "@/lib/recipes/types";
import { RESOLUTION } from "./bench-state";

const BASES: { value: SolveBasis; label: string }[] = [
  { value: "eu", label: "EU basis (inclusions deducted)" },
  { value: "codex", label: "Codex basis (dry matter)" },
  { value: "product", label: "Whole bar (US basis)" },
];

const quantityOptions = QUANTITIES.map((q) => ({ value: q, label: QUANTITY_LABELS[q].replace(/^./, (c) => c.toUpperCase()) }));

/** The richest cocoa line against the sweetest one: the usual way to move the cocoa figure. */
function defaultLines(ingredients: readonly IngredientSpec[]): { adjust: number; balance: number } {
  const by = (f: (i: IngredientSpec) => number) => ingredients.reduce((best, ing, i) => (f(ing) > f(ingredients[best]!) ? i : best), 0);
  const adjust = by((i) => Number(i.cocoaSolidsNonFat ?? 0) + Number(i.cocoaButter ?? 0));
  const balance = by((i) => Number(i.sugar ?? 0));
  return { adjust, balance: balance === adjust ? (adjust + 1) % Math.max(ingredients.length, 1) : balance };
}

/**
 * "Hit 70 %": moves one line against another so a figure lands exactly on the
 * target (solveForTarget). It reads the current lines only when asked to solve,
 * so moving a slider does not redraw it.
 */
export const TargetPanel = memo(function TargetPanel({
  ingredients,
  read,
  chocolateType,
  target,
  onApply,
}: {
  /** The lines' ingredients, in order (stable while only percents move). */
  ingredients: readonly IngredientSpec[];
  read: () => { lines: RecipeLine[]; locked: readonly boolean[] };
  chocolateType: ChocolateType;
  target: string | null;
  onApply: (percents: string[]) => void;
}) {
  const defaults = defaultLines(ingredients);
  const [quantity, setQuantity] = useState<Quantity>(chocolateType === "white" ? "cocoaButter" : "totalDryCocoaSolids");
  const [basis, setBasis] = useState<SolveBasis>("eu");
  const [value, setValue] = useState(target ?? "70");
  const [adjust, setAdjust] = useState(String(defaults.adjust));
  const [balance, setBalance] = useState(String(defaults.balance));
  const [outcome, setOutcome] = useState<{ ok: boolean; text: string; undo?: string[] } | null>(null);
  const lineOptions = ingredients.map((ing, i) => ({ value: String(i), label: ing.name }));

  function solve() {
    const { lines, locked } = read();
    const a = Number(adjust);
    const b = Number(balance);
    if (!lines[a] || !lines[b]) return setOutcome({ ok: false, text: "Choose two lines of the recipe." });
    const solved = solveForTarget(lines, { quantity, value, basis }, a, b, { resolution: RESOLUTION, locked });
    if (!solved.ok) return setOutcome({ ok: false, text: solved.reason });
    const before = lines.map((l) => String(l.percent));
    onApply(solved.lines.map((l) => l.percent));
    const how = solved.exact ? "exactly" : `as close as the ${RESOLUTION} % step allows (exact answer ${pct(solved.exactPercent, 3)})`;
    setOutcome({
      ok: true,
      text: `${lines[a]!.ingredient.name} ${pct(before[a])} → ${pct(solved.lines[a]!.percent)}, ${lines[b]!.ingredient.name} ${pct(before[b])} → ${pct(solved.lines[b]!.percent)}: ${QUANTITY_LABELS[quantity]} ${pct(solved.achieved, 2)}, ${how}.`,
      undo: before,
    });
  }

  return (
    <Card data-testid="target-panel">
      <CardHeader title="Hit a target" description="Move one line against another until a figure is exactly where you want it." />
      <div className="grid gap-3 sm:grid-cols-2">
        <Field id="target-quantity" label="Figure">
          <Select id="target-quantity" ariaLabel="Figure" value={quantity} onValueChange={(v) => setQuantity(v as Quantity)} options={quantityOptions} />
        </Field>
        <Field id="target-value" label="Target">
          <NumberField id="target-value" unit="%" value={value} onChange={(e) => setValue(e.target.value)} />
        </Field>
        <Field id="target-basis" label="On">
          <Select id="target-basis" ariaLabel="On" value={basis} onValueChange={(v) => setBasis(v as SolveBasis)} options={BASES} />
        </Field>
        <div />
        <Field id="target-adjust" label="Adjust">
          <Select id="target-adjust" ariaLabel="Adjust" value={adjust} onValueChange={setAdjust} options={lineOptions} />
        </Field>
        <Field id="target-balance" label="Against">
          <Select id="target-balance" ariaLabel="Against" value={balance} onValueChange={setBalance} options={lineOptions} />
        </Field>
      </div>
      <div className="mt-4 flex items-center gap-3">
        <Button onClick={solve} disabled={ingredients.length < 2}>
          Solve
        </Button>
        {outcome?.undo ? (
          <Button
            variant="quiet"
            onClick={() => {
              onApply(outcome.undo!);
              setOutcome(null);
            }}
          >
            Undo
          </Button>
        ) : null}
      </div>
      {outcome ? (
        <p role="status" className={outcome.ok ? "mt-3 text-sm text-sage" : "mt-3 text-sm text-brick"} data-testid="target-outcome">
          {outcome.text}
        </p>
      ) : null}
    </Card>
  );
});
