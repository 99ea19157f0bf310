import Decimal from "decimal.js";
import Link from "next/link";
import { Table, Td, Th } from "@/components/ui/table";
import type { RecipeCosting } from "@/lib/data/costing";
import { formatPercent } from "@/lib/format";
import { COMPARED_QUANTITIES } from "@/lib/recipes/diff";
import { cents, marginOrReason, perBar } from "./figures";

type Metric = { label: string; value: (c: RecipeCosting) => string; strong?: boolean };

const chosen = (c: RecipeCosting) => c.report.scenarios.chosen;

const METRICS: Metric[] = [
  { label: "Cost per bar", value: (c) => { const k = chosen(c).cost; return k.ok ? perBar(k.costPerBar, c.baseCurrency) : "not costed"; }, strong: true },
  { label: "Bar mass", value: (c) => `${new Decimal(c.version.barMassGrams).toFixed()} g` },
  { label: "Ingredients per kg", value: (c) => { const k = chosen(c).cost; return k.ok ? cents(k.ingredientCostPerKg, c.baseCurrency) : "—"; } },
  { label: "Cost per case", value: (c) => { const k = chosen(c).cost; return k.ok ? `${cents(k.costPerCase, c.baseCurrency)} (${c.settings.barsPerCase})` : "—"; } },
  { label: "Preferred suppliers, per bar", value: (c) => { const k = c.report.scenarios.preferred.cost; return k.ok ? perBar(k.costPerBar, c.baseCurrency) : "not costed"; } },
  { label: "Cheapest sources, per bar", value: (c) => { const k = c.report.scenarios.cheapest.cost; return k.ok ? perBar(k.costPerBar, c.baseCurrency) : "not costed"; } },
  { label: "Margin at the wholesale price", value: (c) => marginOrReason(chosen(c).margins?.wholesaleMargin ?? null, "no price set") },
  { label: "Margin at the retail price", value: (c) => marginOrReason(chosen(c).margins?.retailMargin ?? null, "no price set") },
];

/** Versions as columns; cost, margins, composition and lines as rows. */
export function CompareTable({ costings }: { costings: RecipeCosting[] }) {
  const ingredients = [...new Map(costings.flatMap((c) => c.report.rows.map((r) => [r.ingredientId, r.name] as const))).entries()];
  return (
    <Table data-testid="compare-costs">
      <thead>
        <tr>
          <Th />
          {costings.map((c) => (
            <Th key={`${c.recipe.id}:${c.version.versionNo}`} numeric>
              <Link href={`/costing/${c.recipe.id}?version=${c.version.versionNo}`} className="normal-case text-pod-dark hover:underline">
                {c.recipe.name} v{c.version.versionNo}
              </Link>
            </Th>
          ))}
        </tr>
      </thead>
      <tbody>
        {METRICS.map((m) => (
          <tr key={m.label}>
            <Td className={m.strong ? "font-semibold" : undefined}>{m.label}</Td>
            {costings.map((c) => (
              <Td key={`${c.recipe.id}:${c.version.versionNo}`} numeric className={m.strong ? "font-bold" : undefined}>
                {m.value(c)}
              </Td>
            ))}
          </tr>
        ))}
        <tr>
          <Td colSpan={costings.length + 1} className="bg-cream-deep text-xs font-semibold uppercase tracking-wide text-cocoa-500">
            Composition, % of the bar
          </Td>
        </tr>
        {COMPARED_QUANTITIES.map(([key, label]) => (
          <tr key={key}>
            <Td>{label}</Td>
            {costings.map((c) => (
              <Td key={`${c.recipe.id}:${c.version.versionNo}`} numeric>
                {formatPercent(c.version.composition[key], key === "cocoaSolidsStatement" ? 0 : 1)}
              </Td>
            ))}
          </tr>
        ))}
        <tr>
          <Td colSpan={costings.length + 1} className="bg-cream-deep text-xs font-semibold uppercase tracking-wide text-cocoa-500">
            Lines, % of the recipe, and the chosen source
          </Td>
        </tr>
        {ingredients.map(([id, name]) => (
          <tr key={id}>
            <Td>{name}</Td>
            {costings.map((c) => {
              const row = c.report.rows.find((r) => r.ingredientId === id);
              const source = row ? c.report.columns.find((col) => col.key === row.chosenKey)?.label : undefined;
              return (
                <Td key={`${c.recipe.id}:${c.version.versionNo}`} numeric>
                  {row ? formatPercent(row.percent, 2) : "—"}
                  {row ? <span className="block text-xs text-cocoa-500">{source ?? "no valid source"}</span> : null}
                </Td>
              );
            })}
          </tr>
        ))}
      </tbody>
    </Table>
  );
}
