import type { EuDeclarationRow } from "@/lib/formulation";

/** "2375 kJ / 572 kcal" on two lines, as energy is usually set. */
function Figure({ text }: { text: string | undefined }) {
  const parts = (text ?? "").split(" / ");
  return parts.map((p, i) => (
    <span key={i} className="block">
      {p}
    </span>
  ));
}

/**
 * The EU nutrition declaration as a plain table, in the order of Regulation (EU) No 1169/2011
 * Annex XV; per portion and % reference intake only when a portion is set.
 */
export function EuNutritionTable({ rows, portionGrams }: { rows: EuDeclarationRow[]; portionGrams: string | null }) {
  return (
    <div>
      <table className="w-full border-collapse text-sm" data-testid="eu-nutrition-table">
        <caption className="mb-1 text-left text-base font-bold">Nutrition declaration</caption>
        <thead>
          <tr className="border-b-2 border-cocoa">
            <th scope="col" className="py-1 pr-2 text-left font-semibold">Typical values</th>
            <th scope="col" className="whitespace-nowrap py-1 px-2 text-right font-semibold">per 100 g</th>
            {portionGrams ? (
              <>
                <th scope="col" className="whitespace-nowrap py-1 px-2 text-right font-semibold">per {portionGrams} g</th>
                <th scope="col" className="whitespace-nowrap py-1 pl-2 text-right font-semibold">% RI*</th>
              </>
            ) : null}
          </tr>
        </thead>
        <tbody>
          {rows.map((row) => (
            <tr key={row.key} className="border-b border-cocoa/25" data-row={row.key}>
              <th scope="row" className={row.sub ? "py-1 pl-4 pr-2 text-left font-normal" : "py-1 pr-2 text-left font-semibold"}>
                {row.label}
              </th>
              <td className="figures whitespace-nowrap py-1 px-2 text-right"><Figure text={row.per100g} /></td>
              {portionGrams ? (
                <>
                  <td className="figures whitespace-nowrap py-1 px-2 text-right"><Figure text={row.perPortion} /></td>
                  <td className="figures whitespace-nowrap py-1 pl-2 text-right">{row.referenceIntakePercent !== undefined ? `${row.referenceIntakePercent} %` : ""}</td>
                </>
              ) : null}
            </tr>
          ))}
        </tbody>
      </table>
      {portionGrams ? <p className="mt-1 text-xs">*Reference intake of an average adult (8400 kJ / 2000 kcal).</p> : null}
    </div>
  );
}
