"use client";

import { CartesianGrid, Legend, Line, LineChart, ResponsiveContainer, Tooltip, XAxis, YAxis } from "recharts";
import useSWR from "swr";
import { fetchJson } from "@/components/data/fetch-json";
import { formatDate } from "@/lib/format";
import { quotesKey, type QuotesResponse } from "./quotes-table";

// Our palette: pod amber, sage, cocoa, brick, sand-dark for up to five suppliers.
const COLOURS = ["#C4711F", "#5F7F62", "#4A3328", "#A23E2C", "#A8968A"];

const day = (iso: string) => Date.parse(`${iso}T00:00:00Z`);

/**
 * Price per kg in the base currency over time, one stepped line per supplier:
 * each quote holds from its valid-from day until the next one. Values are
 * plotted as numbers for drawing only; the tooltip shows the exact figures.
 */
export function PriceHistoryChart({ ingredientId, today }: { ingredientId: string; today: string }) {
  const { data } = useSWR(quotesKey({ ingredientId }), fetchJson<QuotesResponse>);
  if (!data) return <div className="h-64 animate-pulse rounded-card bg-sand-light" aria-label="Loading price history" />;
  const bySupplier = new Map<string, { t: number; perKg: number; label: string }[]>();
  for (const q of [...data.quotes].reverse()) {
    if (q.perKgBase === null) continue;
    const list = bySupplier.get(q.supplierName) ?? [];
    list.push({ t: day(q.validFrom), perKg: Number(q.perKgBase), label: q.perKgBase });
    bySupplier.set(q.supplierName, list);
  }
  if (bySupplier.size === 0) return <p className="text-sm text-cocoa-500">No priced quote yet, so no history to draw.</p>;
  const end = day(today);
  return (
    <figure className="h-72" aria-label={`Price history per kg in ${data.baseCurrency}`} data-testid="price-history-chart">
      <ResponsiveContainer width="100%" height="100%">
        <LineChart margin={{ top: 8, right: 16, bottom: 8, left: 8 }}>
          <CartesianGrid stroke="#EFE6DA" />
          <XAxis dataKey="t" type="number" domain={["dataMin", end]} scale="time" tickFormatter={(t: number) => formatDate(new Date(t))} stroke="#6E5647" fontSize={12} />
          <YAxis stroke="#6E5647" fontSize={12} width={64} tickFormatter={(v: number) => `${v.toFixed(2)}`} label={{ value: `${data.baseCurrency} / kg`, angle: -90, position: "insideLeft", fill: "#6E5647", fontSize: 12 }} />
          <Tooltip
            labelFormatter={(t) => formatDate(new Date(Number(t)))}
            formatter={(_v, name, item) => [`${data.baseCurrency} ${(item.payload as { label: string }).label} / kg`, name]}
          />
          <Legend />
          {[...bySupplier].map(([name, points], i) => (
            <Line
              key={name}
              name={name}
              data={[...points, { ...points[points.length - 1]!, t: end }]}
              dataKey="perKg"
              type="stepAfter"
              stroke={COLOURS[i % COLOURS.length]}
              strokeWidth={2}
              dot={{ r: 3 }}
              isAnimationActive={false}
            />
          ))}
        </LineChart>
      </ResponsiveContainer>
    </figure>
  );
}
