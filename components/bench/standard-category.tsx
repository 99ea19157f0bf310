"use client";

import { memo, useMemo, useState } from "react";
import { Badge } from "@/components/ui/badge";
import { Button } from "@/components/ui/button";
import type { StandardResult } from "@/lib/formulation";
import { pct } from "@/lib/recipes/format";
import type { FixOutcome } from "@/lib/recipes/fix-suggestions";
import { gap, verdict } from "@/lib/recipes/verdict";

/** Whatever the bench lends the standards panel to suggest and apply a fix. */
export type Fixer = {
  suggest: (result: StandardResult) => FixOutcome;
  apply: (percents: string[]) => void;
  lineName: (index: number) => string;
};

function FixSuggestionView({ outcome, fixer }: { outcome: FixOutcome; fixer: Fixer }) {
  if (!outcome.ok) return <p className="text-sm text-cocoa-500">{outcome.reason}</p>;
  const { fix } = outcome;
  const up = Number(fix.to) > Number(fix.from);
  return (
    <div className="mt-2 rounded-lg bg-cream-deep p-3 text-sm" data-testid="fix-suggestion">
      <p>
        {up ? "Raise" : "Lower"} <strong>{fixer.lineName(fix.adjustIndex)}</strong> from <span className="figures">{pct(fix.from)}</span> to{" "}
        <span className="figures">{pct(fix.to)}</span>, with <strong>{fixer.lineName(fix.balanceIndex)}</strong> from{" "}
        <span className="figures">{pct(fix.balanceFrom)}</span> to <span className="figures">{pct(fix.balanceTo)}</span>.
      </p>
      {fix.categoryPasses ? null : <p className="mt-1 text-cocoa-500">That meets this limit; another limit of the category still fails after it.</p>}
      <Button size="sm" variant="secondary" className="mt-2" onClick={() => fixer.apply(fix.percents)}>
        Apply this change
      </Button>
    </div>
  );
}

function Header({ result }: { result: StandardResult }) {
  return (
    <div className="flex items-start justify-between gap-3">
      <div>
        <p className="font-semibold first-letter:uppercase">{result.category}</p>
        <p className="text-xs text-cocoa-500">{result.reference}</p>
      </div>
      <Badge tone={result.pass ? "meets" : "short"}>{verdict(result)}</Badge>
    </div>
  );
}

/**
 * One category of one authority: meets, or which limits fail by how much, and a
 * way to meet it. Failing categories the recipe does not aim at stay folded.
 */
export const StandardCategory = memo(function StandardCategory({ result, fixer, aimed }: CategoryProps) {
  const [asked, setAsked] = useState(false);
  const [open, setOpen] = useState(false);
  const failing = result.checks.filter((c) => !c.pass);
  const showFix = fixer !== undefined && failing.length > 0 && (aimed || asked);
  // Several engine runs: only when shown, and again only when the figures change.
  const outcome = useMemo(() => (showFix ? fixer.suggest(result) : null), [showFix, fixer, result]);
  const testId = `standard-${result.authority}-${result.category}`;
  if (failing.length === 0) {
    return (
      <li className="py-2" data-testid={testId}>
        <Header result={result} />
      </li>
    );
  }
  const body = (
    <>
      <ul className="mt-1 space-y-0.5 text-sm">
        {failing.map((check) => (
          <li key={check.label} className="flex justify-between gap-3">
            <span>{check.label}</span>
            <span className="figures whitespace-nowrap text-right text-brick">
              {pct(check.actual)} — {gap(check)}
            </span>
          </li>
        ))}
      </ul>
      {outcome && fixer ? <FixSuggestionView outcome={outcome} fixer={fixer} /> : null}
      {fixer && !showFix ? (
        <Button size="sm" variant="quiet" className="mt-1 px-0 text-pod-dark" onClick={() => setAsked(true)}>
          How to meet it
        </Button>
      ) : null}
    </>
  );
  if (aimed) {
    return (
      <li className="py-2" data-testid={testId}>
        <Header result={result} />
        {body}
      </li>
    );
  }
  return (
    <li className="py-2" data-testid={testId}>
      <details open={open} onToggle={(e) => setOpen(e.currentTarget.open)}>
        <summary className="cursor-pointer list-none [&::-webkit-details-marker]:hidden">
          <Header result={result} />
        </summary>
        {open ? body : null}
      </details>
    </li>
  );
}, sameShown);

type CategoryProps = { result: StandardResult; fixer?: Fixer; aimed?: boolean };

/** What a category shows: when none of it changed, the row is not redrawn (most rows, most moves). */
function sameShown(a: CategoryProps, b: CategoryProps): boolean {
  if (a.aimed !== b.aimed || a.result.pass !== b.result.pass || a.result.category !== b.result.category) return false;
  // A new fixer means new lines: only a failing row can show a fix made from them.
  if (!a.result.pass && a.fixer !== b.fixer) return false;
  const shown = (r: StandardResult) => r.checks.filter((c) => !c.pass).map((c) => `${c.label}|${c.actual}|${c.shortBy}|${c.overBy}`).join(";");
  return a.result.authority === b.result.authority && shown(a.result) === shown(b.result);
}
