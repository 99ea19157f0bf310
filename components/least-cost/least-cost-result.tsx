"use client";

import Decimal from "decimal.js";
import { Badge } from "@/components/ui/badge";
import { Button } from "@/components/ui/button";
import { Table, Td, Th } from "@/components/ui/table";
import { formatPercent, type CategoryRef, type LeastCostResult, type LeastCostSolution } from "@/lib/formulation";
import { money, signed } from "@/lib/recipes/format";

const tight = "px-2";
const heading = "whitespace-nowrap px-2";

/** The proposal beside the current mix, narrow enough for the bench's side column. */
function Comparison({ solution, currency, decimals }: { solution: LeastCostSolution; currency: string; decimals: number }) {
  const difference = solution.saving === undefined ? undefined : new Decimal(solution.saving).negated().toFixed();
  return (
    <div className="space-y-2">
      <Table data-testid="least-cost-proposal">
        <thead>
          <tr>
            <Th className={tight}>Line</Th>
            <Th numeric className={heading}>
              Now %
            </Th>
            <Th numeric className={heading}>
              Proposed %
            </Th>
            <Th numeric className={heading}>
              Change
            </Th>
          </tr>
        </thead>
        <tbody>
          {solution.lines.map((line) => (
            <tr key={line.index}>
              <Td className={`${tight} break-words`}>{line.name}</Td>
              <Td numeric className={tight}>
                {formatPercent(line.currentPercent, decimals) ?? "—"}
              </Td>
              <Td numeric className={`${tight} font-semibold`}>
                {formatPercent(line.percent, decimals) ?? "—"}
              </Td>
              <Td numeric className={tight}>
                {signed(line.change, decimals)}
              </Td>
            </tr>
          ))}
        </tbody>
      </Table>
      <dl className="grid grid-cols-[1fr_auto] gap-x-3 gap-y-0.5 text-sm">
        <dt className="text-cocoa-500">Ingredient cost per kg now</dt>
        <dd className="figures text-right">{money(solution.currentCostPerKg, currency)}</dd>
        <dt className="text-cocoa-500">Proposed</dt>
        <dd className="figures text-right font-semibold" data-testid="least-cost-cost">
          {money(solution.costPerKg, currency)}
        </dd>
        <dt className="text-cocoa-500">Difference per kg</dt>
        <dd className="figures text-right" data-testid="least-cost-saving">
          {difference === undefined ? "—" : `${signed(difference, 2)} ${currency}`}
        </dd>
      </dl>
    </div>
  );
}

/** The proposal beside the current mix, what holds the cost up, the standards check, and apply. */
export function LeastCostResultView({
  result,
  categories,
  currency,
  decimals,
  onApply,
}: {
  result: LeastCostResult;
  categories: CategoryRef[];
  currency: string;
  /** Decimals of the bench's grid step. */
  decimals: number;
  onApply: (percents: string[]) => void;
}) {
  if (!result.ok) {
    return (
      <div role="alert" className="space-y-2 rounded-lg border border-brick/40 bg-brick-light p-3 text-sm" data-testid="least-cost-conflict">
        <p className="font-semibold text-brick">{result.message}</p>
        {result.kind === "infeasible" ? (
          <ul className="list-disc pl-5 text-cocoa-700">
            {result.conflict.map((c) => (
              <li key={c.id}>
                {c.label}
                {c.clause ? <span className="text-cocoa-500"> ({c.clause})</span> : null}
              </li>
            ))}
          </ul>
        ) : null}
        {result.kind === "infeasible" ? <p className="text-cocoa-700">Loosen one of these and run it again.</p> : null}
      </div>
    );
  }
  const binding = result.constraints.filter((c) => c.binding);
  const chosen = result.evaluation.standards.filter((s) => categories.some((c) => c.authority === s.authority && c.category === s.category));
  return (
    <div className="space-y-3" data-testid="least-cost-result">
      <Comparison solution={result} currency={currency} decimals={decimals} />
      <div className="flex flex-wrap gap-2" data-testid="least-cost-standards">
        {chosen.map((s) => (
          <Badge key={`${s.authority} ${s.category}`} tone={s.pass ? "meets" : "short"}>
            {s.authority} {s.category}: {s.pass ? "meets" : "short"}
          </Badge>
        ))}
      </div>
      {binding.length > 0 ? (
        <div className="text-sm">
          <p className="font-semibold text-cocoa-700">Holding the cost up</p>
          <ul className="list-disc pl-5 text-cocoa-700" data-testid="least-cost-binding">
            {binding.map((c) => (
              <li key={c.id}>{c.label}</li>
            ))}
          </ul>
        </div>
      ) : null}
      {result.notes.length > 0 ? (
        <ul className={result.verified ? "text-sm text-cocoa-500" : "text-sm text-brick"}>
          {result.notes.map((n) => (
            <li key={n}>{n}</li>
          ))}
        </ul>
      ) : null}
      <p className="text-xs text-cocoa-500">
        Rounded to the {result.rounding.resolution} % step and checked again by the standards check; the unrounded optimum costs {money(result.optimalCostPerKg, currency, 4)}. Confirm the category with your local regulations before labelling.
      </p>
      <Button onClick={() => onApply(result.lines.map((l) => l.percent))}>Apply as draft</Button>
    </div>
  );
}
