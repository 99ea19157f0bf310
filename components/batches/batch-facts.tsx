import { formatGrams } from "@/lib/batches/format-mass";
import type { BatchDetail } from "@/lib/data/batches";
import { formatDate, formatNumber } from "@/lib/format";

const REQUESTED_UNIT = { g: "g", kg: "kg", t: "t", bars: "bars" } as const;

/** The batch's plan at a glance: what, how much, on which machine and scale. */
export function BatchFacts({ batch }: { batch: BatchDetail }) {
  const step = batch.resolutionGrams;
  const facts: [string, string][] = [
    ["Recipe", `${batch.recipeName} v${batch.versionNo}`],
    ["Planned for", formatDate(batch.plannedFor)],
    ["Batch mass", formatGrams(batch.totalMassGrams, step)],
    ["Asked for", `${formatNumber(batch.requestedAmount, 3).replace(/\.?0+$/, "")} ${REQUESTED_UNIT[batch.requestedUnit]}`],
    ["Loads", batch.machineName ? `${batch.loadCount} × ${batch.machineName} (${formatNumber(batch.machineCapacityKg, 1)} kg)` : "1"],
    ["Weighing station", `${batch.stationName} (${step} g step)`],
  ];
  return (
    <dl className="grid gap-x-8 gap-y-2 text-sm sm:grid-cols-3">
      {facts.map(([k, v]) => (
        <div key={k}>
          <dt className="text-cocoa-500">{k}</dt>
          <dd className="figures font-semibold" data-testid={`fact-${k.toLowerCase().replace(/ /g, "-")}`}>
            {v}
          </dd>
        </div>
      ))}
    </dl>
  );
}
