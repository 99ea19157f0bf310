import Decimal from "decimal.js";
import type { LabelView } from "@/lib/labels/build-label-view";
import { EuNutritionTable } from "./eu-nutrition-table";
import { IngredientList } from "./ingredient-list";
import { LabelCaution } from "./label-caution";
import { UsNutritionPanel } from "./us-nutrition-panel";

function MayContain({ text }: { text: string | null }) {
  if (!text) return null;
  return <p data-testid="label-may-contain">May contain {text}.</p>;
}

/**
 * The label of one saved version: the EU side (ingredients with allergens in bold, solids
 * statements, nutrition declaration) and the US side (ingredients, Contains statement, the
 * Nutrition Facts figures). Black on white so it prints as it shows.
 */
export function LabelSheet({ name, barMassGrams, versionNo, view }: { name: string; barMassGrams: string; versionNo: number; view: LabelView }) {
  return (
    <article className="label-sheet space-y-4 bg-white p-6 text-cocoa" data-testid="label-sheet" aria-label={`Label of ${name}`}>
      <header className="flex flex-wrap items-baseline justify-between gap-2 border-b border-cocoa pb-2">
        <h2 className="text-xl font-bold">{name}</h2>
        <p className="figures text-sm">
          net {new Decimal(barMassGrams).toFixed()} g · from v{versionNo}
        </p>
      </header>
      <div className="grid gap-6 md:grid-cols-2 print:grid-cols-2">
        <section aria-labelledby="label-eu" className="space-y-3 text-sm">
          <h3 id="label-eu" className="text-xs font-semibold uppercase tracking-widest">EU (Regulation (EU) No 1169/2011)</h3>
          <IngredientList items={view.statement.eu} testId="eu-ingredients" />
          {view.solids.cocoa ? <p data-testid="solids-statement">{[view.solids.cocoa, view.solids.milk].filter(Boolean).join(", ")}.</p> : null}
          <MayContain text={view.mayContain} />
          <EuNutritionTable rows={view.eu.rows} portionGrams={view.eu.portionGrams} />
        </section>
        <section aria-labelledby="label-us" className="space-y-3 text-sm">
          <h3 id="label-us" className="text-xs font-semibold uppercase tracking-widest">US (21 CFR 101)</h3>
          <IngredientList items={view.statement.us} testId="us-ingredients" />
          {view.allergens.usContains ? <p className="font-semibold" data-testid="us-contains">{view.allergens.usContains}</p> : null}
          <MayContain text={view.mayContain} />
          {view.us.panel ? <UsNutritionPanel panel={view.us.panel} /> : <p className="text-brick">{view.us.problem}</p>}
        </section>
      </div>
      <footer className="space-y-1 border-t border-cocoa/40 pt-2">
        {view.gaps.length > 0 ? (
          <p className="text-xs font-semibold text-brick" data-testid="label-incomplete">
            Incomplete: no nutrient figures for {view.gaps.map((g) => g.ingredient).join(", ")} (counted as 0 g).
          </p>
        ) : null}
        <LabelCaution compact />
      </footer>
    </article>
  );
}
