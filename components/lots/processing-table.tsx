import { formatDate, formatKg, formatMoney, formatNumber } from "@/lib/format";

type Row = {
  record: {
    id: string;
    step: "sorting" | "roasting" | "winnowing";
    performedOn: string;
    massInKg: string;
    massOutKg: string;
    rejectsKg: string | null;
    shellKg: string | null;
    dustKg: string | null;
    roastTemperatureC: string | null;
    roastMinutes: string | null;
    cost: string | null;
    notes: string | null;
  };
  performedBy: string | null;
};

const stepName = { sorting: "Sorting", roasting: "Roasting", winnowing: "Cracking and winnowing" } as const;

function details(r: Row["record"]): string {
  if (r.step === "sorting") return `rejects ${formatKg(r.rejectsKg)}`;
  if (r.step === "roasting") return `${formatNumber(r.roastTemperatureC)} °C for ${formatNumber(r.roastMinutes, 0)} min`;
  return `shell ${formatKg(r.shellKg)}, dust ${formatKg(r.dustKg)}`;
}

/** The lot's processing records; the cost column only for those who may see costs. */
export function ProcessingTable({ records, showCost }: { records: Row[]; showCost: boolean }) {
  if (records.length === 0) return <p className="text-sm text-cocoa-500">Nothing recorded yet.</p>;
  return (
    <div className="overflow-x-auto">
      <table className="figures w-full text-sm" data-testid="processing-records">
        <thead>
          <tr className="text-left text-xs uppercase tracking-wide text-cocoa-500">
            <th className="px-2 py-1.5">Date</th>
            <th className="px-2 py-1.5">Step</th>
            <th className="px-2 py-1.5 text-right">In</th>
            <th className="px-2 py-1.5 text-right">Out</th>
            <th className="px-2 py-1.5">Details</th>
            {showCost ? <th className="px-2 py-1.5 text-right">Cost</th> : null}
            <th className="px-2 py-1.5">By</th>
          </tr>
        </thead>
        <tbody>
          {records.map(({ record: r, performedBy }) => (
            <tr key={r.id} className="border-t border-sand-light align-top">
              <td className="px-2 py-1.5">{formatDate(r.performedOn)}</td>
              <td className="px-2 py-1.5 font-semibold">{stepName[r.step]}</td>
              <td className="px-2 py-1.5 text-right">{formatKg(r.massInKg)}</td>
              <td className="px-2 py-1.5 text-right">{formatKg(r.massOutKg)}</td>
              <td className="px-2 py-1.5">
                {details(r)}
                {r.notes ? <span className="block text-xs text-cocoa-500">{r.notes}</span> : null}
              </td>
              {showCost ? <td className="px-2 py-1.5 text-right">{r.cost ? formatMoney(r.cost, "") : "—"}</td> : null}
              <td className="px-2 py-1.5">{performedBy ?? "—"}</td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
