import Decimal from "decimal.js";
import { Card, CardHeader } from "@/components/ui/card";
import type { CostSettings, ScenarioReport } from "@/lib/costing";
import { formatPercent } from "@/lib/format";
import { cents, marginOrReason, moneyOrReason, perBar } from "./figures";

function Row({ label, value, testId, strong }: { label: string; value: string; testId?: string; strong?: boolean }) {
  return (
    <div className="flex justify-between gap-4 py-1.5">
      <dt className={strong ? "font-semibold" : undefined}>{label}</dt>
      <dd className={strong ? "figures whitespace-nowrap text-right font-bold" : "figures whitespace-nowrap text-right"} data-testid={testId}>
        {value}
      </dd>
    </div>
  );
}

/** The chosen combination's cost by part, per kg and per case, and the selling side. */
export function CostBreakdown({ scenario, settings, currency, barMassGrams }: { scenario: ScenarioReport; settings: CostSettings; currency: string; barMassGrams: string }) {
  const { cost, margins } = scenario;
  if (!cost.ok) {
    return (
      <Card>
        <CardHeader title="Cost model" description="The chosen combination cannot be costed yet." />
        <p className="text-sm text-brick">{cost.reason} Pick a source with a valid price for it, or enter a quote.</p>
      </Card>
    );
  }
  const b = cost.breakdown;
  return (
    <div className="grid grid-cols-1 gap-6 lg:grid-cols-2">
      <Card>
        <CardHeader title="Cost of one bar" description={`Chosen combination, bar of ${new Decimal(barMassGrams).toFixed()} g, in ${currency}.`} />
        <dl className="divide-y divide-sand-light text-sm">
          <Row label="Ingredients" value={perBar(b.ingredients, currency)} />
          <Row label={`Process loss (${formatPercent(settings.processLossPercent, 1)} of the chocolate)`} value={perBar(b.processLoss, currency)} />
          <Row label="Labour" value={perBar(b.labour, currency)} />
          <Row label="Overhead" value={perBar(b.overhead, currency)} />
          <Row label="Packaging" value={perBar(b.packaging, currency)} />
          <Row label="Cost per bar" value={perBar(cost.costPerBar, currency)} testId="chosen-cost-per-bar" strong />
          <Row label="Ingredients per kg going in" value={cents(cost.ingredientCostPerKg, currency)} />
          <Row label="Ingredients per kg of finished chocolate" value={cents(cost.costPerKgFinished, currency)} />
          <Row label={`Cost per case of ${settings.barsPerCase}`} value={cents(cost.costPerCase, currency)} />
        </dl>
      </Card>
      <Card>
        <CardHeader title="Prices and margins" description="Gross margin as a share of the selling price, per bar, taxes excluded." />
        <dl className="divide-y divide-sand-light text-sm">
          <Row
            label={`Wholesale price at ${settings.wholesaleMarginPercent ? formatPercent(settings.wholesaleMarginPercent, 1) : "a target"} margin`}
            value={moneyOrReason(margins?.wholesalePriceAtTarget ?? null, currency, "no target set")}
            testId="wholesale-price-at-target"
          />
          <Row
            label={`Retail price at ${settings.retailMarginPercent ? formatPercent(settings.retailMarginPercent, 1) : "a target"} margin`}
            value={moneyOrReason(margins?.retailPriceAtTarget ?? null, currency, "no target set")}
            testId="retail-price-at-target"
          />
          <Row
            label={`Margin at the wholesale price${settings.wholesalePricePerBar ? ` of ${cents(settings.wholesalePricePerBar, currency)}` : ""}`}
            value={marginOrReason(margins?.wholesaleMargin ?? null, "no price set")}
            testId="wholesale-margin"
          />
          <Row
            label={`Margin at the retail price${settings.retailPricePerBar ? ` of ${cents(settings.retailPricePerBar, currency)}` : ""}`}
            value={marginOrReason(margins?.retailMargin ?? null, "no price set")}
            testId="retail-margin"
          />
        </dl>
      </Card>
    </div>
  );
}
