import { Badge } from "@/components/ui/badge";
import type { IngredientRecord } from "@/lib/data/ingredients";
import { allergenLabel } from "@/lib/ingredients/allergens";
import { COMPOSITION_FIELDS, NUTRIENT_FIELDS } from "@/lib/ingredients/kinds";
import { formatNumber } from "@/lib/format";
import { compositionTotal } from "./composition-total";

const row = "flex justify-between gap-4 border-b border-sand-light py-1.5 text-sm";

/** An ingredient's composition (with its "other" remainder), nutrients, allergens and the source of its figures. */
export function IngredientProfile({ ingredient }: { ingredient: IngredientRecord }) {
  const sum = compositionTotal(ingredient);
  return (
    <div className="grid gap-8 md:grid-cols-3">
      <dl data-testid="composition">
        <h3 className="mb-2 font-bold">Composition, g per 100 g</h3>
        {COMPOSITION_FIELDS.map((f) => (
          <div key={f.key} className={row}>
            <dt className="text-cocoa-700">{f.label}</dt>
            <dd className="figures">{formatNumber(ingredient[f.key], 2)} g</dd>
          </div>
        ))}
        <div className={`${row} font-semibold`}>
          <dt>Other (the rest)</dt>
          <dd className="figures">{sum ? `${formatNumber(sum.other, 2)} g` : "—"}</dd>
        </div>
        {ingredient.isInclusion ? <Badge className="mt-2" tone="accent">inclusion: deducted by the standards</Badge> : null}
      </dl>
      <dl>
        <h3 className="mb-2 font-bold">Nutrients, g per 100 g</h3>
        {NUTRIENT_FIELDS.map((f) => (
          <div key={f.key} className={row}>
            <dt className="text-cocoa-700">{f.label}</dt>
            <dd className="figures">{ingredient[f.key] === null ? <span className="text-cocoa-300">not known</span> : `${formatNumber(ingredient[f.key], 2)} g`}</dd>
          </div>
        ))}
      </dl>
      <div className="space-y-4 text-sm">
        <div>
          <h3 className="mb-2 font-bold">Allergens</h3>
          {ingredient.allergens.length ? (
            <div className="flex flex-wrap gap-2">
              {ingredient.allergens.map((a) => (
                <Badge key={a} tone="short">
                  {allergenLabel(a)}
                </Badge>
              ))}
            </div>
          ) : (
            <p className="text-cocoa-500">None listed.</p>
          )}
          <p className="mt-2 text-xs text-cocoa-500">
            From Regulation (EU) No 1169/2011 Annex II. Confirm with the supplier&apos;s spec sheet and your local rules; cross-contact is
            not covered.
          </p>
        </div>
        <div>
          <h3 className="mb-1 font-bold">Source of the figures</h3>
          <p className="text-cocoa-700" data-testid="ingredient-source">{ingredient.source ?? "Not given."}</p>
        </div>
        {ingredient.notes ? (
          <div>
            <h3 className="mb-1 font-bold">Notes</h3>
            <p className="whitespace-pre-line text-cocoa-700">{ingredient.notes}</p>
          </div>
        ) : null}
      </div>
    </div>
  );
}
