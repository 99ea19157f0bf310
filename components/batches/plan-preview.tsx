import { formatGrams } from "@/lib/batches/format-mass";
import { formatPercent } from "@/lib/format";
import type { Preview } from "./use-batch-preview";

/** The engine's masses for the batch being planned, before it is saved. */
export function PlanPreview({ preview }: { preview: Preview }) {
  const step = preview.resolutionGrams;
  const loads = preview.loads;
  return (
    <div className="space-y-3" data-testid="plan-preview">
      <p className="text-sm text-cocoa-700">
        <span className="font-semibold">{preview.recipe.name}</span> v{preview.versionNo}: <span className="figures font-semibold" data-testid="preview-total">{formatGrams(preview.totalMassGrams, step)}</span>{" "}
        in {loads.length === 1 ? "one load" : `${loads.length} loads of ${[...new Set(loads)].map((l) => formatGrams(l, step)).join(" or ")}`}, weighed to {step} g.
      </p>
      <table className="w-full text-sm">
        <thead>
          <tr className="text-left text-xs uppercase tracking-wide text-cocoa-500">
            <th className="py-1 font-semibold">Ingredient</th>
            <th className="py-1 text-right font-semibold">%</th>
            <th className="py-1 text-right font-semibold">Batch</th>
          </tr>
        </thead>
        <tbody>
          {preview.lines.map((l) => (
            <tr key={l.position} className="border-t border-sand-light">
              <td className="py-1.5">{l.ingredientName}</td>
              <td className="figures py-1.5 text-right">{formatPercent(l.percent, 2)}</td>
              <td className="figures py-1.5 text-right">{formatGrams(l.massGrams, step)}</td>
            </tr>
          ))}
        </tbody>
      </table>
      {preview.notes.length ? (
        <ul className="space-y-1 rounded-md bg-pod-light px-3 py-2 text-sm text-pod-dark" role="note">
          {preview.notes.map((n) => (
            <li key={n}>{n}</li>
          ))}
        </ul>
      ) : null}
    </div>
  );
}
