"use client";

import { memo } from "react";
import { Bar, BarChart, ResponsiveContainer, XAxis, YAxis } from "recharts";
import type { CompositionFigures } from "@/lib/formulation";
import { pct } from "@/lib/recipes/format";

/** The mix's parts in the order they are stacked, with our colours (display only). */
export const MIX_PARTS = [
  { key: "cocoaButter", label: "Cocoa butter", colour: "#C9A27E" },
  { key: "cocoaSolidsNonFat", label: "Fat-free cocoa solids", colour: "#4A3328" },
  { key: "milkFat", label: "Milk fat", colour: "#EAD7B0" },
  { key: "milkSolidsNonFat", label: "Non-fat milk solids", colour: "#B8A68A" },
  { key: "sugar", label: "Sugar", colour: "#C4711F" },
  { key: "vegetableFat", label: "Other fats", colour: "#8AA27F" },
  { key: "moisture", label: "Moisture", colour: "#9DB7C4" },
  { key: "other", label: "Other", colour: "#A8968A" },
  { key: "inclusions", label: "Inclusions", colour: "#7A5A3A" },
] as const satisfies ReadonlyArray<{ key: keyof CompositionFigures; label: string; colour: string }>;

/** One stacked bar of the finished product by part; figures stay exact in the list beside it. */
export const CompositionChart = memo(function CompositionChart({ composition }: { composition: CompositionFigures }) {
  // Numbers only for drawing widths; every figure shown as text comes from the engine's strings.
  const row = Object.fromEntries(MIX_PARTS.map((p) => [p.key, Number(composition[p.key])]));
  const summary = MIX_PARTS.filter((p) => Number(composition[p.key]) > 0)
    .map((p) => `${p.label} ${pct(composition[p.key])}`)
    .join(", ");
  return (
    <div role="img" aria-label={`The mix: ${summary}`} className="h-12 w-full">
      <ResponsiveContainer width="100%" height="100%">
        <BarChart data={[row]} layout="vertical" margin={{ top: 0, right: 0, bottom: 0, left: 0 }} barCategoryGap={0}>
          <XAxis type="number" domain={[0, 100]} hide />
          <YAxis type="category" hide />
          {MIX_PARTS.map((p) => (
            <Bar key={p.key} dataKey={p.key} stackId="mix" fill={p.colour} isAnimationActive={false} />
          ))}
        </BarChart>
      </ResponsiveContainer>
    </div>
  );
});
