/**
 * The supplier comparison as CSV: one line per ingredient with each source's
 * price per kg, the cheapest, preferred and chosen source and the buying
 * flags; then the three scenarios' cost per kg, bar and case. Cells go through
 * lib/csv/export (formula triggers neutralised, RFC 4180 quoting). Figures are
 * rounded to 4 decimals: finer than the cent, so sums can be checked.
 */
import { roundMoney } from "@/lib/formulation";
import { toCsv, type CsvCell } from "@/lib/csv/export";
import { SCENARIO_LABELS, type CostingReport, type ComparisonRow } from "./report";
import type { ScenarioName } from "./types";

const four = (v: string | null | undefined) => (v ? roundMoney(v, 4) : null);

export function comparisonCsv(report: CostingReport, ctx: { recipeName: string; versionNo: number; currency: string; on: string }): string {
  const labelOf = (key: string | null) => report.columns.find((c) => c.key === key)?.label ?? "";
  const columns: { header: string; value: (row: ComparisonRow) => CsvCell }[] = [
    { header: "Ingredient", value: (r) => r.name },
    { header: "Share of recipe (%)", value: (r) => r.percent },
    { header: "Need per batch (kg)", value: (r) => r.needKg },
    ...report.columns.map((c) => ({ header: `${c.label} (${ctx.currency}/kg)`, value: (r: ComparisonRow) => four(r.cells[c.key]?.option.perKg) })),
    { header: "Cheapest", value: (r) => labelOf(r.cheapestKey) },
    { header: "Preferred", value: (r) => labelOf(r.preferredKey) },
    { header: "Chosen", value: (r) => labelOf(r.chosenKey) },
    { header: "Flags", value: (r) => Object.values(r.cells).flatMap((c) => c.flags.filter((f) => f.severity === "warn").map((f) => `${c.option.label}: ${f.message}`)).join(" | ") },
  ];
  const scenarios = (Object.keys(SCENARIO_LABELS) as ScenarioName[]).map((name) => report.scenarios[name]);
  const summary = toCsv(
    [
      { header: `${ctx.recipeName} v${ctx.versionNo}, prices of ${ctx.on}`, value: (s: (typeof scenarios)[number]) => SCENARIO_LABELS[s.name] },
      { header: `Ingredients per kg (${ctx.currency})`, value: (s) => (s.cost.ok ? four(s.cost.ingredientCostPerKg) : null) },
      { header: `Cost per bar (${ctx.currency})`, value: (s) => (s.cost.ok ? four(s.cost.costPerBar) : null) },
      { header: `Cost per case (${ctx.currency})`, value: (s) => (s.cost.ok ? four(s.cost.costPerCase) : null) },
      { header: "Why not costed", value: (s) => (s.cost.ok ? null : s.cost.reason) },
    ],
    scenarios,
  );
  return `${toCsv(columns, report.rows)}\r\n${summary}`;
}
