import { Badge } from "@/components/ui/badge";
import { Card } from "@/components/ui/card";
import type { NibCost } from "@/lib/data/lots";
import { formatKg, formatMoney } from "@/lib/format";
import type { ChainSummary } from "@/lib/formulation";

export function NibCostCard({
  nibCost,
  chain,
  baseCurrency,
  costs,
  lot,
  processingCost,
}: {
  nibCost: NibCost;
  chain: ChainSummary;
  baseCurrency: string;
  costs: { id: string; label: string; amount: string; currency: string }[];
  lot: { pricePaid: string; currency: string };
  /** Sum of recorded processing costs, base currency. */
  processingCost: string | null;
}) {
  return (
    <Card className="self-start bg-cream-deep/60">
      <p className="text-sm font-semibold text-cocoa-500">Nibs cost</p>
      <p className="figures mt-1 text-3xl font-bold" data-testid="nib-cost">
        {nibCost.perKg ? `${formatMoney(nibCost.perKg, baseCurrency)}` : "—"}
        <span className="text-base font-semibold text-cocoa-500"> per kg</span>
      </p>
      {nibCost.estimated ? (
        <Badge className="mt-2">estimate: winnowing not recorded</Badge>
      ) : null}
      {nibCost.problem && !nibCost.perKg ? <p className="mt-2 text-sm text-brick">{nibCost.problem}</p> : null}
      <dl className="figures mt-4 space-y-1.5 text-sm">
        <div className="flex justify-between">
          <dt>Price paid</dt>
          <dd>{formatMoney(lot.pricePaid, lot.currency)}</dd>
        </div>
        {costs.map((c) => (
          <div key={c.id} className="flex justify-between">
            <dt>{c.label}</dt>
            <dd>{formatMoney(c.amount, c.currency)}</dd>
          </div>
        ))}
        {processingCost ? (
          <div className="flex justify-between">
            <dt>Processing (recorded)</dt>
            <dd>{formatMoney(processingCost, baseCurrency)}</dd>
          </div>
        ) : null}
        <div className="flex justify-between border-t border-sand pt-1.5 font-semibold">
          <dt>Nibs {chain.nibMassEstimated ? "(estimated)" : ""}</dt>
          <dd>{formatKg(chain.nibMassKg)}</dd>
        </div>
      </dl>
      <p className="mt-4 text-xs text-cocoa-500">
        (Price paid + costs + recorded processing costs) ÷ nibs, converted to {baseCurrency} at the exchange rate of the
        arrival date.
      </p>
    </Card>
  );
}
