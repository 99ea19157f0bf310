"use client";

import { Bar, BarChart, CartesianGrid, Legend, ReferenceLine, ResponsiveContainer, Tooltip, XAxis, YAxis } from "recharts";
import type { SwapBar } from "@/lib/costing";
import { perBar } from "./figures";

// Our palette (pod amber, sage, cocoa, brick, sand-dark, pod-dark) and lighter steps of it, then repeat.
const COLOURS = ["#C4711F", "#5F7F62", "#4A3328", "#A23E2C", "#A8968A", "#9E5714", "#8FA991", "#D9A066", "#6E5647"];

/**
 * Cost per bar with each source of each ingredient swapped into the chosen
 * combination (the rest unchanged): one group per ingredient, one bar per
 * supplier or lot. Numbers are plotted for drawing only; labels show the
 * figures as computed.
 */
export function SupplierChart({ swaps, chosenPerBar, currency }: { swaps: SwapBar[]; chosenPerBar: string | null; currency: string }) {
  const shown = swaps.filter((s) => s.bars.some((b) => b.costPerBar !== null));
  if (shown.length === 0) return <p className="text-sm text-cocoa-500">No ingredient has a priced source yet, so there is nothing to chart.</p>;
  const series = [...new Set(shown.flatMap((s) => s.bars.map((b) => b.label)))];
  const data = shown.map((s) => {
    const row: Record<string, string | number> = { ingredient: s.name };
    for (const b of s.bars) if (b.costPerBar !== null) row[b.label] = Number(b.costPerBar);
    return row;
  });
  const exact = new Map(shown.flatMap((s) => s.bars.map((b) => [`${s.name}|${b.label}`, b.costPerBar] as const)));
  return (
    <figure className="h-80" aria-label={`Cost per bar in ${currency} by source of each ingredient`} data-testid="supplier-chart">
      <ResponsiveContainer width="100%" height="100%">
        <BarChart data={data} margin={{ top: 8, right: 56, bottom: 8, left: 8 }}>
          <CartesianGrid stroke="#EFE6DA" vertical={false} />
          <XAxis dataKey="ingredient" stroke="#6E5647" fontSize={12} />
          <YAxis stroke="#6E5647" fontSize={12} width={72} domain={["auto", "auto"]} tickFormatter={(v: number) => v.toFixed(3)} label={{ value: `${currency} / bar`, angle: -90, position: "insideLeft", fill: "#6E5647", fontSize: 12 }} />
          <Tooltip formatter={(_v, name, item) => [perBar(exact.get(`${(item.payload as { ingredient: string }).ingredient}|${String(name)}`) ?? null, currency), name]} />
          <Legend />
          {chosenPerBar ? <ReferenceLine y={Number(chosenPerBar)} stroke="#2B1A12" strokeDasharray="4 4" label={{ value: "chosen", fill: "#2B1A12", fontSize: 11, position: "right" }} /> : null}
          {series.map((label, i) => (
            <Bar key={label} dataKey={label} fill={COLOURS[i % COLOURS.length]} isAnimationActive={false} />
          ))}
        </BarChart>
      </ResponsiveContainer>
    </figure>
  );
}
