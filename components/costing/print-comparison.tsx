import type { ComparisonRow, CostingReport, PriceOption } from "@/lib/costing";
import { formatPercent } from "@/lib/format";
import { cents } from "./figures";

function Source({ option, currency }: { option: PriceOption | undefined; currency: string }) {
  if (!option) return <span className="text-cocoa-500">none valid</span>;
  return (
    <>
      {option.label}
      <span className="figures block whitespace-nowrap font-semibold">{option.perKg ? `${cents(option.perKg, currency)}/kg` : "no price"}</span>
    </>
  );
}

/**
 * The supplier comparison narrowed for paper: per ingredient the chosen,
 * cheapest and preferred sources, the other sources' prices and the warnings
 * (the screen's one-column-per-source table would not fit a page).
 */
export function PrintComparison({ report, currency }: { report: CostingReport; currency: string }) {
  const option = (row: ComparisonRow, key: string | null) => (key ? row.cells[key]?.option : undefined);
  return (
    <table className="w-full border-collapse text-sm" data-testid="print-comparison">
      <thead>
        <tr className="border-b border-sand text-left text-xs uppercase tracking-wide text-cocoa-500">
          <th className="py-2 pr-3">Ingredient</th>
          <th className="py-2 pr-3">Chosen</th>
          <th className="py-2 pr-3">Cheapest</th>
          <th className="py-2 pr-3">Preferred</th>
          <th className="py-2">Other sources and warnings</th>
        </tr>
      </thead>
      <tbody>
        {report.rows.map((row) => {
          const named = new Set([row.chosenKey, row.cheapestKey, row.preferredKey]);
          const others = Object.values(row.cells).filter((c) => !named.has(c.option.key));
          const warnings = Object.values(row.cells).flatMap((c) => c.flags.filter((f) => f.severity === "warn").map((f) => `${c.option.label}: ${f.message}`));
          return (
            <tr key={row.ingredientId} className="break-inside-avoid border-b border-sand-light align-top">
              <td className="py-2 pr-3">
                <span className="font-semibold">{row.name}</span>
                <span className="block text-xs text-cocoa-500">{formatPercent(row.percent, 2)}</span>
              </td>
              <td className="py-2 pr-3"><Source option={option(row, row.chosenKey)} currency={currency} /></td>
              <td className="py-2 pr-3"><Source option={option(row, row.cheapestKey)} currency={currency} /></td>
              <td className="py-2 pr-3"><Source option={option(row, row.preferredKey)} currency={currency} /></td>
              <td className="py-2 text-xs">
                {others.map((c) => (
                  <span key={c.option.key} className="block">
                    {c.option.label}: {c.option.perKg ? `${cents(c.option.perKg, currency)}/kg` : "no price"}
                  </span>
                ))}
                {warnings.map((w) => (
                  <span key={w} className="block text-brick">
                    {w}
                  </span>
                ))}
              </td>
            </tr>
          );
        })}
      </tbody>
    </table>
  );
}
