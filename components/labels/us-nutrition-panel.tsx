import type { UsPanel, UsPanelCell, UsPanelRow } from "@/lib/formulation";

const NEEDS = "needs a figure";

function Cell({ cell }: { cell: UsPanelCell | undefined }) {
  if (!cell) return <td colSpan={2} className="py-0.5 pl-2 text-right text-xs italic text-brick">{NEEDS}</td>;
  return (
    <>
      <td className="figures py-0.5 pl-2 text-right">{cell.amount}</td>
      <td className="figures w-12 py-0.5 pl-2 text-right font-semibold">{cell.percentDailyValue ?? ""}</td>
    </>
  );
}

function label(row: UsPanelRow) {
  if (row.key === "addedSugars") return row.perServing ? `Includes ${row.perServing.amount} Added Sugars` : "Includes Added Sugars";
  return row.label;
}

/**
 * The US Nutrition Facts figures in our own plain layout, nutrients in the order of
 * 21 CFR 101.9(c). It is for checking the figures: printed artwork must follow the graphic
 * format of 21 CFR 101.9(d).
 */
export function UsNutritionPanel({ panel }: { panel: UsPanel }) {
  const dual = panel.kind === "dual-column";
  return (
    <div className="border-2 border-cocoa p-3 text-sm" data-testid="us-nutrition-panel">
      <p className="text-xl font-extrabold leading-tight">Nutrition Facts</p>
      <p className="mt-1" data-testid="us-servings">{panel.servingsPerContainer} servings per container</p>
      <p className="flex justify-between border-b-4 border-cocoa pb-1 font-bold">
        <span>Serving size</span>
        <span data-testid="us-serving-size">{panel.servingSize}</span>
      </p>
      <table className="mt-1 w-full border-collapse">
        <thead>
          {dual ? (
            <tr className="text-xs">
              <th />
              <th colSpan={2} className="text-right font-semibold">Per serving</th>
              <th colSpan={2} className="text-right font-semibold">Per bar</th>
            </tr>
          ) : null}
          <tr className="border-b-2 border-cocoa">
            <th scope="row" className="py-1 text-left text-lg font-extrabold">Calories</th>
            <td colSpan={2} className="figures py-1 text-right text-lg font-extrabold" data-testid="us-calories">{panel.calories.perServing}</td>
            {dual ? <td colSpan={2} className="figures py-1 text-right text-lg font-extrabold">{panel.calories.perPackage}</td> : null}
          </tr>
          <tr className="text-xs">
            <th />
            <th colSpan={2} className="text-right font-semibold">% Daily Value*</th>
            {dual ? <th colSpan={2} className="text-right font-semibold">% Daily Value*</th> : null}
          </tr>
        </thead>
        <tbody>
          {panel.rows.map((row) => (
            <tr key={row.key} className="border-t border-cocoa/40" data-row={row.key}>
              <th scope="row" className={["py-0.5 text-left", row.indent === 0 ? "font-bold" : "font-normal", row.indent === 1 ? "pl-3" : row.indent === 2 ? "pl-6" : ""].join(" ")}>
                {label(row)}
              </th>
              <Cell cell={row.key === "addedSugars" && row.perServing ? { ...row.perServing, amount: "" } : row.perServing} />
              {dual ? <Cell cell={row.perPackage} /> : null}
            </tr>
          ))}
        </tbody>
      </table>
      <p className="mt-1 border-t-4 border-cocoa pt-1 text-xs">
        * The % Daily Value (DV) tells you how much a nutrient in a serving of food contributes to a daily diet. 2,000 calories a day is used for general nutrition advice.
      </p>
    </div>
  );
}
