import Decimal from "decimal.js";
import { Badge } from "@/components/ui/badge";
import { Card } from "@/components/ui/card";
import { SCENARIO_LABELS, type CostingReport, type ScenarioName } from "@/lib/costing";
import { cn } from "@/lib/cn";
import { cents, perBar } from "./figures";

const NAMES: ScenarioName[] = ["preferred", "cheapest", "chosen"];

const HINTS: Record<ScenarioName, string> = {
  preferred: "Each ingredient from its preferred supplier.",
  cheapest: "Each ingredient from its cheapest source today.",
  chosen: "Your pick per ingredient; the preferred supplier where you made none.",
};

/** The cost per bar of the three combinations side by side; the lowest marked. */
export function ScenarioCards({ report, currency }: { report: CostingReport; currency: string }) {
  const costs = NAMES.map((n) => report.scenarios[n].cost).filter((c) => c.ok).map((c) => (c.ok ? c.costPerBar : ""));
  const lowest = costs.length ? costs.reduce((a, b) => (new Decimal(a).lte(b) ? a : b)) : null;
  return (
    <div className="grid gap-4 md:grid-cols-3">
      {NAMES.map((name) => {
        const s = report.scenarios[name];
        const notes = s.choices.map((c) => c.note).filter((n): n is string => !!n);
        return (
          <Card key={name} className={cn("p-5", name === "chosen" && "border-pod")} data-testid={`scenario-${name}`}>
            <div className="flex items-center justify-between gap-2">
              <h3 className="font-bold">{SCENARIO_LABELS[name]}</h3>
              {s.cost.ok && s.cost.costPerBar === lowest ? <Badge tone="meets">lowest</Badge> : null}
            </div>
            <p className="mt-1 text-xs text-cocoa-500">{HINTS[name]}</p>
            {s.cost.ok ? (
              <dl className="mt-3 space-y-1 text-sm">
                <div className="flex justify-between">
                  <dt>Per bar</dt>
                  <dd className="figures text-xl font-bold" data-testid={`scenario-${name}-per-bar`}>
                    {perBar(s.cost.costPerBar, currency)}
                  </dd>
                </div>
                <div className="flex justify-between text-cocoa-700">
                  <dt>Ingredients per kg</dt>
                  <dd className="figures">{cents(s.cost.ingredientCostPerKg, currency)}</dd>
                </div>
                <div className="flex justify-between text-cocoa-700">
                  <dt>Per case</dt>
                  <dd className="figures">{cents(s.cost.costPerCase, currency)}</dd>
                </div>
              </dl>
            ) : (
              <p className="mt-3 text-sm text-brick" data-testid={`scenario-${name}-problem`}>
                Not costed: {s.cost.reason}
              </p>
            )}
            {notes.length ? (
              <ul className="mt-3 space-y-1 text-xs text-cocoa-700">
                {notes.map((n) => (
                  <li key={n}>{n}</li>
                ))}
              </ul>
            ) : null}
          </Card>
        );
      })}
    </div>
  );
}
