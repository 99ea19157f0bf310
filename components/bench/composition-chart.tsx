"use client";

import { memo } from "react";
import { Bar, BarChart, Cell, ResponsiveContainer, XAxis, YAxis } from "recharts";
import type { CompositionFigures } from "@/lib/formulation";
import { pct } from "@/lib/recipes/format";

/** The mix's parts in display order, with our colours (display only). */
const MIX_PARTS = [
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

const ROW_HEIGHT = 22;

/**
 * One bar per part of the finished product (parts at 0 are left out). One Recharts
 * series with a colour per bar: a single series redraws several times faster than
 * a stack of nine. Every figure shown as text comes from the engine's strings.
 */
export const CompositionChart = memo(function CompositionChart({ composition }: { composition: CompositionFigures }) {
  // Numbers only for drawing lengths.
  const rows = MIX_PARTS.map((p) => ({ ...p, value: Number(composition[p.key]) })).filter((r) => r.value > 0);
  const summary = rows.map((r) => `${r.label} ${pct(composition[r.key])}`).join(", ");
  return (
    <div role="img" aria-label={`The mix: ${summary}`} style={{ height: rows.length * ROW_HEIGHT + 4 }} className="w-full">
      <ResponsiveContainer width="100%" height="100%">
        <BarChart data={rows} layout="vertical" margin={{ top: 2, right: 4, bottom: 2, left: 0 }} barCategoryGap={4}>
          <XAxis type="number" domain={[0, 100]} hide />
          <YAxis type="category" dataKey="label" width={128} tickLine={false} axisLine={false} tick={{ fontSize: 12, fill: "#6E5647" }} interval={0} />
          <Bar dataKey="value" isAnimationActive={false} radius={3}>
            {rows.map((r) => (
              <Cell key={r.key} fill={r.colour} />
            ))}
          </Bar>
        </BarChart>
      </ResponsiveContainer>
    </div>
  );
});
