"use client";

import { Bar, BarChart, CartesianGrid, LabelList, ResponsiveContainer, Tooltip, XAxis, YAxis } from "recharts";

/** Mass remaining after each step, as bars. */
export function MassFlowChart({ data }: { data: { label: string; kg: number }[] }) {
  return (
    <div className="h-56 w-full" role="img" aria-label={`Mass after each step: ${data.map((d) => `${d.label} ${d.kg} kg`).join(", ")}`}>
      <ResponsiveContainer width="100%" height="100%">
        <BarChart data={data} margin={{ top: 20, right: 8, left: 8, bottom: 0 }}>
          <CartesianGrid vertical={false} stroke="#EFE6DA" />
          <XAxis dataKey="label" tick={{ fill: "#6E5647", fontSize: 12 }} axisLine={{ stroke: "#E6DACB" }} tickLine={false} />
          <YAxis unit=" kg" tick={{ fill: "#6E5647", fontSize: 12 }} axisLine={false} tickLine={false} width={70} />
          <Tooltip formatter={(v) => [`${Number(v).toFixed(2)} kg`, "Mass"]} />
          <Bar dataKey="kg" fill="#C4711F" radius={[4, 4, 0, 0]} isAnimationActive={false}>
            <LabelList dataKey="kg" position="top" formatter={(v) => `${Number(v).toFixed(1)}`} fill="#2B1A12" fontSize={12} />
          </Bar>
        </BarChart>
      </ResponsiveContainer>
    </div>
  );
}
