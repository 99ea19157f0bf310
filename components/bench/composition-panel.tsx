"use client";

import { useLayoutEffect } from "react";
import { Card, CardHeader } from "@/components/ui/card";
import type { CompositionFigures } from "@/lib/formulation";
import { pct } from "@/lib/recipes/format";
import { CompositionChart, MIX_PARTS } from "./composition-chart";
import { markPaintAfterCommit } from "./paint-probe";
import { useThrottled } from "./use-throttled";

const FIGURES = [
  ["totalDryCocoaSolids", "Total dry cocoa solids"],
  ["cocoaButter", "Cocoa butter"],
  ["cocoaSolidsNonFat", "Fat-free cocoa solids"],
  ["dryMilkSolids", "Milk solids"],
  ["milkFat", "Milk fat"],
  ["totalFat", "Total fat"],
  ["sugar", "Sugar"],
] as const;

/** What is in the bar, percent of the finished product, with the label's cocoa figure. */
export function CompositionPanel({ composition }: { composition: CompositionFigures }) {
  useLayoutEffect(() => markPaintAfterCommit(), [composition]);
  // The figures follow every move at once; the chart (Recharts, several times dearer to redraw)
  // follows a drag about eight times a second and always lands on the final mix.
  const charted = useThrottled(composition, 120);
  const hasInclusions = Number(composition.inclusions) > 0;
  return (
    <Card data-testid="composition-panel">
      <CardHeader title="Composition" description="Percent of the finished bar." />
      <CompositionChart composition={charted} />
      <ul className="mt-2 flex flex-wrap gap-x-3 gap-y-1 text-xs text-cocoa-500" aria-hidden>
        {MIX_PARTS.filter((p) => Number(composition[p.key]) > 0).map((p) => (
          <li key={p.key} className="flex items-center gap-1">
            <span className="inline-block size-2.5 rounded-sm" style={{ background: p.colour }} />
            {p.label}
          </li>
        ))}
      </ul>
      <dl className="mt-4 divide-y divide-sand-light text-sm">
        {FIGURES.map(([key, label]) => (
          <div key={key} className="flex justify-between py-1.5">
            <dt>{label}</dt>
            <dd className="figures text-right font-semibold" data-testid={`figure-${key}`}>
              {pct(composition[key])}
            </dd>
          </div>
        ))}
        {hasInclusions ? (
          <div className="flex justify-between py-1.5">
            <dt>Inclusions</dt>
            <dd className="figures text-right font-semibold">{pct(composition.inclusions)}</dd>
          </div>
        ) : null}
        <div className="flex justify-between py-1.5">
          <dt>
            Label cocoa %
            <span className="block text-xs text-cocoa-500">EU “cocoa solids: X % minimum”, inclusions deducted, rounded down</span>
          </dt>
          <dd className="figures whitespace-nowrap text-right text-lg font-bold" data-testid="label-cocoa">
            {pct(composition.cocoaSolidsStatement, 0)}
          </dd>
        </div>
      </dl>
    </Card>
  );
}
