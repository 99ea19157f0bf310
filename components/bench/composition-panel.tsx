"use client";

import { useLayoutEffect } from "react";
import { Card, CardHeader } from "@/components/ui/card";
import type { CompositionFigures } from "@/lib/formulation";
import { pct } from "@/lib/recipes/format";
import { CompositionChart } from "./composition-chart";
import { markPaintAfterCommit } from "./paint-probe";

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
  // The figures and the chart (plain elements, cheap to redraw) follow every move at once.
  const hasInclusions = Number(composition.inclusions) > 0;
  return (
    <Card data-testid="composition-panel">
      <CardHeader title="Composition" description="Percent of the finished bar." />
      <CompositionChart composition={composition} />
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
