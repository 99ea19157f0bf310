import type { CostSettingsRecord } from "@/lib/data/cost-settings";
import { formatDate } from "@/lib/format";

/** The last revisions of the cost settings: who changed them, when and why. */
export function SettingsHistory({ history }: { history: CostSettingsRecord[] }) {
  if (history.length === 0) return <p className="text-sm text-cocoa-500">No cost settings saved yet: the figures above are ingredients only.</p>;
  return (
    <ol className="space-y-1 text-sm text-cocoa-700" aria-label="Revisions of the cost settings">
      {history.map((h) => (
        <li key={h.revision}>
          <span className="font-semibold">Revision {h.revision}</span> · {formatDate(h.createdAt)} · {h.createdByName ?? "someone who left"}
          {h.note ? ` · ${h.note}` : ""}
        </li>
      ))}
    </ol>
  );
}
