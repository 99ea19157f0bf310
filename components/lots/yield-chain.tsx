import { formatKg, formatPercent } from "@/lib/format";
import type { ChainSummary } from "@/lib/formulation";
import { MassFlowChart } from "./mass-flow-chart";

const labels = { sorting: "Sorting", roasting: "Roasting", winnowing: "Winnowing" } as const;
const lossLabels = { sorting: "rejects", roasting: "roast loss", winnowing: "shell" } as const;

/** The chain as a flow of masses, each step's figures, and what looks wrong. */
export function YieldChain({ received, chain }: { received: string; chain: ChainSummary }) {
  const flow = [
    { label: "Received", kg: Number(received) },
    ...chain.steps.map((s) => ({ label: labels[s.step], kg: Number(s.massOutKg) })),
  ];
  if (chain.nibMassEstimated) flow.push({ label: "Nibs (estimate)", kg: Number(chain.nibMassKg) });
  return (
    <div className="space-y-5">
      <MassFlowChart data={flow} />
      <div className="overflow-x-auto">
        <table className="figures w-full text-sm" data-testid="chain-table">
          <thead>
            <tr className="text-left text-xs uppercase tracking-wide text-cocoa-500">
              <th className="px-2 py-1.5">Step</th>
              <th className="px-2 py-1.5 text-right">In</th>
              <th className="px-2 py-1.5 text-right">Out</th>
              <th className="px-2 py-1.5 text-right">Yield</th>
              <th className="px-2 py-1.5 text-right">Loss</th>
            </tr>
          </thead>
          <tbody>
            {chain.steps.map((s) => (
              <tr key={s.step} className="border-t border-sand-light">
                <td className="px-2 py-1.5 font-semibold">{labels[s.step]}</td>
                <td className="px-2 py-1.5 text-right">{formatKg(s.massInKg)}</td>
                <td className="px-2 py-1.5 text-right">{formatKg(s.massOutKg)}</td>
                <td className="px-2 py-1.5 text-right">{formatPercent(s.yieldPercent)}</td>
                <td className="px-2 py-1.5 text-right">
                  {formatPercent(s.lossPercent)} <span className="text-cocoa-500">{lossLabels[s.step]}</span>
                </td>
              </tr>
            ))}
            <tr className="border-t-2 border-sand font-semibold">
              <td className="px-2 py-1.5">Raw beans → nibs</td>
              <td className="px-2 py-1.5 text-right">{formatKg(received)}</td>
              <td className="px-2 py-1.5 text-right">{formatKg(chain.nibMassKg)}</td>
              <td className="px-2 py-1.5 text-right" data-testid="cumulative-yield">
                {formatPercent(chain.cumulativeYieldPercent)}
              </td>
              <td className="px-2 py-1.5 text-right text-cocoa-500">{chain.nibMassEstimated ? "estimate" : ""}</td>
            </tr>
          </tbody>
        </table>
      </div>
      {chain.notices.length > 0 ? (
        <ul className="space-y-1.5" aria-label="Figures to check">
          {chain.notices.map((n, i) => (
            <li key={i} className="rounded-md bg-brick-light px-3 py-2 text-sm text-brick">
              {n.message}
            </li>
          ))}
        </ul>
      ) : chain.steps.length > 0 ? (
        <p className="text-sm text-sage">Every figure is inside the usual range and the masses add up.</p>
      ) : (
        <p className="text-sm text-cocoa-500">No processing recorded yet: nibs are estimated from the workspace&apos;s usual yield.</p>
      )}
    </div>
  );
}
