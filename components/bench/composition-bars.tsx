"use client";

import { Bar, BarChart, Cell, ResponsiveContainer, XAxis, YAxis } from "recharts";

export type MixRow = { key: string; label: string; colour: string; value: number };

/**
 * The Recharts drawing of the mix (one series with a colour per bar: a single
 * series redraws several times faster than a stack of nine). Its own module so
 * that Recharts loads after the bench is on screen (composition-chart.tsx).
 */
export default function CompositionBars({ rows }: { rows: MixRow[] }) {
  return (
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
  );
}
