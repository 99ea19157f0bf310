"use client";

import { useMemo, useState } from "react";
import { CartesianGrid, Legend, Line, LineChart, ResponsiveContainer, Tooltip, XAxis, YAxis } from "recharts";
import { Card, CardHeader } from "@/components/ui/card";
import { Field } from "@/components/ui/field";
import { fieldClass } from "@/components/ui/input";
import { sensitivity, type Choice, type CostLine, type CostSettings } from "@/lib/costing";
import { formatPercent } from "@/lib/format";
import { cn } from "@/lib/cn";
import { cents, perBar } from "./figures";
import { WhatIf } from "./what-if";

type Props = { lines: CostLine[]; choices: Choice[]; settings: CostSettings; barMassGrams: string; currency: string };

/**
 * How the cost per bar and the margins move when one ingredient's price moves
 * from −20 % to +50 % (the engine, run here in the browser), and a "what if"
 * price that is tried without saving a quote.
 */
export function SensitivityPanel({ lines, choices, settings, barMassGrams, currency }: Props) {
  const priced = lines.filter((l, i) => lines.findIndex((o) => o.ingredientId === l.ingredientId) === i && choices.find((c) => c.ingredientId === l.ingredientId)?.perKg);
  const [ingredientId, setIngredientId] = useState(priced.find((l) => l.kind === "sugar")?.ingredientId ?? priced[0]?.ingredientId ?? "");
  const base = useMemo(() => ({ lines, choices, settings, barMassGrams }), [lines, choices, settings, barMassGrams]);
  const result = useMemo(() => (ingredientId ? sensitivity(base, ingredientId) : null), [base, ingredientId]);
  if (priced.length === 0 || !result) {
    return (
      <Card>
        <CardHeader title="Sensitivity" description="Needs at least one ingredient with a price in the chosen combination." />
      </Card>
    );
  }
  const name = priced.find((l) => l.ingredientId === ingredientId)?.name ?? "";
  const margins = settings.wholesalePricePerBar !== null || settings.retailPricePerBar !== null;
  const data = result.ok
    ? result.points.map((p) => ({
        change: p.changePercent,
        cost: p.costPerBar === null ? null : Number(p.costPerBar),
        wholesale: p.wholesaleMargin === null ? null : Number(p.wholesaleMargin),
        retail: p.retailMargin === null ? null : Number(p.retailMargin),
        exact: p,
      }))
    : [];
  return (
    <Card>
      <CardHeader title="Sensitivity" description="The chosen combination with one ingredient's price changed, everything else as it is." />
      <div className="mb-4 max-w-xs">
        <Field id="sensitivity-ingredient" label="Ingredient">
          <select id="sensitivity-ingredient" className={cn(fieldClass, "text-sm")} value={ingredientId} onChange={(e) => setIngredientId(e.target.value)}>
            {priced.map((l) => (
              <option key={l.ingredientId} value={l.ingredientId}>
                {l.name}
              </option>
            ))}
          </select>
        </Field>
      </div>
      {result.ok ? (
        <figure className="h-72" aria-label={`Cost per bar as the price of ${name} changes`} data-testid="sensitivity-chart">
          <ResponsiveContainer width="100%" height="100%">
            <LineChart data={data} margin={{ top: 8, right: 16, bottom: 8, left: 8 }}>
              <CartesianGrid stroke="#EFE6DA" />
              <XAxis dataKey="change" stroke="#6E5647" fontSize={12} tickFormatter={(v: number) => `${v > 0 ? "+" : ""}${v} %`} />
              <YAxis yAxisId="cost" stroke="#6E5647" fontSize={12} width={72} domain={["auto", "auto"]} tickFormatter={(v: number) => v.toFixed(3)} label={{ value: `${currency} / bar`, angle: -90, position: "insideLeft", fill: "#6E5647", fontSize: 12 }} />
              {margins ? <YAxis yAxisId="margin" orientation="right" stroke="#5F7F62" fontSize={12} width={56} domain={["auto", "auto"]} tickFormatter={(v: number) => `${v.toFixed(0)} %`} /> : null}
              <Tooltip
                labelFormatter={(v) => `${name} ${Number(v) > 0 ? "+" : ""}${v} %`}
                formatter={(_v, key, item) => {
                  const p = (item.payload as { exact: (typeof data)[number]["exact"] }).exact;
                  if (key === "Cost per bar") return [`${perBar(p.costPerBar, currency)} (at ${cents(p.perKg, currency)}/kg)`, key];
                  return [formatPercent(key === "Wholesale margin" ? p.wholesaleMargin : p.retailMargin, 1), key];
                }}
              />
              <Legend />
              <Line yAxisId="cost" name="Cost per bar" dataKey="cost" stroke="#C4711F" strokeWidth={2} dot={{ r: 3 }} isAnimationActive={false} />
              {settings.wholesalePricePerBar !== null ? <Line yAxisId="margin" name="Wholesale margin" dataKey="wholesale" stroke="#5F7F62" strokeWidth={2} dot={false} isAnimationActive={false} /> : null}
              {settings.retailPricePerBar !== null ? <Line yAxisId="margin" name="Retail margin" dataKey="retail" stroke="#4A3328" strokeWidth={2} strokeDasharray="5 3" dot={false} isAnimationActive={false} /> : null}
            </LineChart>
          </ResponsiveContainer>
        </figure>
      ) : (
        <p className="text-sm text-brick">{result.reason}</p>
      )}
      {margins ? null : <p className="mt-2 text-xs text-cocoa-500">Enter a wholesale or retail price in the cost settings to see the margin move too.</p>}
      <WhatIf key={ingredientId} base={base} ingredientId={ingredientId} name={name} basePerKg={result.ok ? result.basePerKg : null} currency={currency} />
    </Card>
  );
}
