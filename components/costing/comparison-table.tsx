"use client";

import { useState, useTransition } from "react";
import { pickSupplierAction, resetPicksAction } from "@/app/(app)/costing/actions";
import { FormAlert } from "@/components/forms/form-alert";
import { Badge } from "@/components/ui/badge";
import { Button } from "@/components/ui/button";
import { fieldClass } from "@/components/ui/input";
import { Table, Td, Th } from "@/components/ui/table";
import type { ComparisonRow, CostingReport } from "@/lib/costing";
import { cn } from "@/lib/cn";
import { formatKg, formatPercent } from "@/lib/format";
import { cents } from "./figures";
import { OptionFlags } from "./option-flags";

type Props = { recipeId: string; report: CostingReport; currency: string; canEdit: boolean };

/**
 * One row per ingredient, one column per supplier or bean lot that can sell
 * it today (price per kg in the base currency). The cheapest cell of each row
 * is highlighted; the last column holds the chosen source (a list for those
 * who may change it).
 */
export function ComparisonTable({ recipeId, report, currency, canEdit }: Props) {
  const [pending, start] = useTransition();
  const [problem, setProblem] = useState<string | null>(null);
  const run = (work: () => Promise<{ ok: boolean; message?: string }>) =>
    start(async () => {
      const result = await work();
      setProblem(result.ok ? null : (result.message ?? "That did not work."));
    });
  const pick = (row: ComparisonRow, source: string) => run(() => pickSupplierAction({ recipeId, ingredientId: row.ingredientId, source }));
  return (
    <div className="space-y-3" aria-busy={pending}>
      <FormAlert result={problem ? { ok: false, message: problem } : null} />
      <Table data-testid="supplier-comparison">
        <thead>
          <tr>
            <Th>Ingredient</Th>
            {report.columns.map((c) => (
              <Th key={c.key} numeric>
                {c.label}
              </Th>
            ))}
            <Th>Chosen</Th>
          </tr>
        </thead>
        <tbody>
          {report.rows.map((row) => (
            <tr key={row.ingredientId} data-testid={`comparison-row-${row.name}`}>
              <Td className="min-w-44">
                <span className="font-semibold">{row.name}</span>
                <span className="block text-xs text-cocoa-500">
                  {formatPercent(row.percent, 2)} of the recipe{row.needKg ? ` · ${formatKg(row.needKg, 3)} per batch` : ""}
                </span>
              </Td>
              {report.columns.map((c) => {
                const cell = row.cells[c.key];
                if (!cell) return <Td key={c.key} numeric className="text-cocoa-300">—</Td>;
                const cheapest = row.cheapestKey === c.key;
                return (
                  <Td key={c.key} numeric className={cn("whitespace-normal", cheapest && "bg-sage-light")} data-cheapest={cheapest || undefined}>
                    <span className="whitespace-nowrap font-semibold">{cell.option.perKg ? `${cents(cell.option.perKg, currency)}/kg` : "no price"}</span>
                    <span className="mt-1 flex flex-wrap justify-end gap-1">
                      {cheapest ? <Badge tone="meets">cheapest</Badge> : null}
                      {row.preferredKey === c.key ? <Badge>preferred</Badge> : null}
                      {row.chosenKey === c.key ? <Badge tone="accent">chosen</Badge> : null}
                    </span>
                    <OptionFlags cell={cell} />
                  </Td>
                );
              })}
              <Td>
                {canEdit ? (
                  <select
                    aria-label={`Source of ${row.name}`}
                    className={cn(fieldClass, "min-w-48 text-sm")}
                    value={row.chosenKey && row.chosenKey !== row.preferredKey ? row.chosenKey : "preferred"}
                    disabled={pending}
                    onChange={(e) => pick(row, e.target.value)}
                  >
                    <option value="preferred">Preferred supplier</option>
                    {Object.values(row.cells).map(({ option }) => (
                      <option key={option.key} value={option.key} disabled={option.perKg === null}>
                        {option.label}
                      </option>
                    ))}
                  </select>
                ) : (
                  <span>{report.columns.find((c) => c.key === row.chosenKey)?.label ?? "no valid source"}</span>
                )}
              </Td>
            </tr>
          ))}
        </tbody>
      </Table>
      {canEdit ? (
        <Button variant="quiet" size="sm" disabled={pending} onClick={() => run(() => resetPicksAction({ recipeId }))}>
          Back to the preferred suppliers
        </Button>
      ) : null}
    </div>
  );
}
