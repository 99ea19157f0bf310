import Link from "next/link";
import { cents, marginOrReason, perBar } from "@/components/costing/figures";
import { Badge } from "@/components/ui/badge";
import { Card, CardHeader } from "@/components/ui/card";
import { Table, Td, Th } from "@/components/ui/table";
import { FewFooter } from "./few-footer";
import { cn } from "@/lib/cn";
import type { Few, ReleasedMargin } from "@/lib/data/overview";
import { formatPercent } from "@/lib/format";
import type { MoneyResult } from "@/lib/formulation";

/** A margin at the entered price over the recipe's target for it, in brick when under. */
function MarginCell({ margin, target, below, testId }: { margin: MoneyResult | null; target: string | null; below: boolean; testId: string }) {
  return (
    <Td numeric data-testid={testId}>
      <span className={cn(below && "font-semibold text-brick")}>{marginOrReason(margin, "—")}</span>
      {target === null ? null : <span className="block text-xs text-cocoa-500">target {formatPercent(target, 1)}</span>}
    </Td>
  );
}

/** Released bars: what one costs today with the chosen suppliers and cost settings, and the margin at the prices entered. */
export function MarginsCard({ margins }: { margins: Few<ReleasedMargin> }) {
  return (
    <Card data-testid="overview-margins" className="lg:col-span-2">
      <CardHeader
        title="Margins of released bars"
        description="Each released version costed at today's quotes with its chosen suppliers and cost settings (packaging, labour, overhead, losses), against the selling prices entered on Costing."
      />
      {margins.rows.length === 0 ? (
        <p className="text-sm text-cocoa-500">No recipe is released yet. Release a version from its history to see its margin here.</p>
      ) : (
        <Table>
          <thead>
            <tr>
              <Th>Bar</Th>
              <Th numeric>Cost per bar</Th>
              <Th numeric>Wholesale</Th>
              <Th numeric>Margin</Th>
              <Th numeric>Retail</Th>
              <Th numeric>Margin</Th>
              <Th>
                <span className="sr-only">Against target</span>
              </Th>
            </tr>
          </thead>
          <tbody>
            {margins.rows.map((m) => (
              <tr key={m.recipeId} data-testid={`margin-${m.recipeId}`}>
                <Td>
                  <Link href={`/costing/${m.recipeId}?version=${m.versionNo}`} className="font-semibold text-pod-dark hover:underline">
                    {m.name}
                  </Link>
                  <span className="ml-1.5 text-xs text-cocoa-500">v{m.versionNo}</span>
                </Td>
                {m.costPerBar === null ? (
                  <Td colSpan={5} className="text-sm text-brick">
                    Not costed: {m.problem}
                  </Td>
                ) : (
                  <>
                    <Td numeric className="font-semibold">
                      {perBar(m.costPerBar, m.currency)}
                    </Td>
                    <Td numeric>{m.wholesalePricePerBar === null ? "—" : cents(m.wholesalePricePerBar, m.currency)}</Td>
                    <MarginCell margin={m.wholesaleMargin} target={m.wholesaleTargetPercent} below={m.wholesaleBelowTarget} testId="wholesale-margin" />
                    <Td numeric>{m.retailPricePerBar === null ? "—" : cents(m.retailPricePerBar, m.currency)}</Td>
                    <MarginCell margin={m.retailMargin} target={m.retailTargetPercent} below={m.retailBelowTarget} testId="retail-margin" />
                  </>
                )}
                <Td>
                  {m.costPerBar === null ? null : m.wholesaleBelowTarget || m.retailBelowTarget ? (
                    <Badge tone="short">below target</Badge>
                  ) : m.wholesaleTargetPercent !== null || m.retailTargetPercent !== null ? (
                    <Badge tone="meets">on target</Badge>
                  ) : null}
                </Td>
              </tr>
            ))}
          </tbody>
        </Table>
      )}
      {margins.rows.length > 0 ? (
        <p className="mt-3 text-xs text-cocoa-500">Margin is gross margin on the selling price: (price − cost) ÷ price. Targets are set per recipe on Costing.</p>
      ) : null}
      <FewFooter shown={margins.rows.length} total={margins.total} href="/costing" where="Costing" />
    </Card>
  );
}
