import type { LabelView } from "@/lib/labels/build-label-view";

/**
 * What the label rests on and what it lacks, for the person who checks it: missing figures,
 * figures taken from reference profiles, the allergens found, and the rules applied.
 */
export function LabelNotes({ view }: { view: LabelView }) {
  return (
    <div className="space-y-4 text-sm" data-testid="label-notes">
      {view.gaps.length > 0 ? (
        <div className="rounded-lg bg-brick-light px-3 py-2 text-brick" role="alert" data-testid="label-gaps">
          <p className="font-semibold">Incomplete nutrition figures (counted as 0 g)</p>
          <ul className="mt-1 list-disc pl-5">
            {view.gaps.map((g) => (
              <li key={g.ingredient}>
                {g.ingredient}: no {g.nutrients.join(", ")}
              </li>
            ))}
          </ul>
          <p className="mt-1">Add the figures to the ingredient in the library (from the supplier&apos;s specification or an analysis).</p>
        </div>
      ) : null}
      {view.warnings.length > 0 ? (
        <ul className="list-disc rounded-lg bg-pod-light py-2 pl-8 pr-3 text-pod-dark">
          {view.warnings.map((w) => (
            <li key={w}>{w}</li>
          ))}
        </ul>
      ) : null}
      <div>
        <p className="font-semibold">Allergens found</p>
        {view.allergens.eu.length === 0 ? (
          <p className="text-cocoa-700">None of the 14 of Regulation (EU) No 1169/2011 Annex II in the ingredients&apos; records.</p>
        ) : (
          <ul className="mt-1 space-y-0.5 text-cocoa-700" data-testid="label-allergens">
            {view.allergens.eu.map((a) => (
              <li key={a.code}>
                <strong>{a.name}</strong> in {a.ingredients.join(", ")} <span className="text-cocoa-500">({a.clause})</span>
              </li>
            ))}
          </ul>
        )}
      </div>
      {view.fallbacks.length > 0 ? (
        <div>
          <p className="font-semibold">Figures from reference profiles</p>
          <ul className="mt-1 space-y-1 text-cocoa-700">
            {view.fallbacks.map((f) => (
              <li key={f.ingredient}>
                {f.ingredient}: {f.nutrients.join(", ")} — {f.sources.join("; ")}
              </li>
            ))}
          </ul>
        </div>
      ) : null}
      <div className="text-cocoa-700">
        <p className="font-semibold text-cocoa">How the figures are made</p>
        <ul className="mt-1 list-disc space-y-0.5 pl-5">
          <li>Composition, names and allergens from the saved version; nutrient figures from the ingredient library as it is today.</li>
          <li>EU energy with the factors of Regulation (EU) No 1169/2011 Annex XIV; rounding after the Commission&apos;s guidance of December 2012.</li>
          <li>US calories 4/4/9 on unrounded amounts (21 CFR 101.9(c)(1)(i)(B)); rounding per FDA Food Labeling Guide Appendix H.</li>
          {view.us.clauses.map((c) => (
            <li key={c}>{c}</li>
          ))}
          <li>Ingredient names: the reference profile&apos;s legal or customary name where there is one, else the library name — check each.</li>
        </ul>
      </div>
    </div>
  );
}
