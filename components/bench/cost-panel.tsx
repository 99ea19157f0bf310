"use client";

import { useState } from "react";
import { Card, CardHeader } from "@/components/ui/card";
import { Field } from "@/components/ui/field";
import { NumberField } from "@/components/ui/number-field";
import { costRecipe, type RecipeLine } from "@/lib/formulation";
import { money } from "@/lib/recipes/format";
import { LOT_PRICED_KINDS, withLotPrices, type LotChoices, type LotPriceSource } from "@/lib/recipes/lot-prices";
import { LotSourcePicker, PREFERRED } from "./lot-source-picker";

const GRAMS = /^\d{1,5}(\.\d{1,2})?$/;

/**
 * Ingredient cost per kg and per bar from each line's price (the preferred
 * supplier's current quote, in base currency), recomputed on every move. A
 * nibs or cocoa liquor line can be priced from a bean lot's nibs instead: a
 * choice for this look at the bench only (saved versions keep the preferred
 * quotes; the costing page keeps the buyer's chosen sources).
 */
export function CostPanel({
  lines,
  ingredients,
  lotSources = [],
  barMassGrams,
  currency,
  onBarMass,
}: {
  lines: RecipeLine[];
  /** The ingredient of each line, in line order. */
  ingredients: ReadonlyArray<{ id: string; kind: string; name: string }>;
  lotSources?: readonly LotPriceSource[];
  barMassGrams: string;
  currency: string;
  onBarMass?: (grams: string) => void;
}) {
  const [text, setText] = useState<string | null>(null);
  const [choices, setChoices] = useState<LotChoices>({});
  const priced = withLotPrices(lines, ingredients, choices, lotSources);
  const cost = costRecipe(priced, { barMassGrams });
  const chosenLots = ingredients.flatMap((i) => lotSources.filter((s) => s.lotId === choices[i.id]));
  const fromLots = chosenLots.length > 0;
  const estimate = chosenLots.some((s) => s.estimated) ? " (estimate)" : "";
  const pickable = lotSources.length ? ingredients.filter((i) => LOT_PRICED_KINDS.includes(i.kind)) : [];
  const choose = (ingredientId: string, lotId: string) =>
    setChoices(({ [ingredientId]: _old, ...rest }) => (lotId === PREFERRED ? rest : { ...rest, [ingredientId]: lotId }));
  const error = text !== null && (!GRAMS.test(text.trim()) || Number(text) <= 0) ? "Enter the bar mass in grams, above 0." : undefined;
  return (
    <Card data-testid="cost-panel">
      <CardHeader
        title="Cost"
        description={`Ingredients only, in ${currency}, at today's preferred quotes${fromLots ? " and the nib cost of the lots chosen below" : ""}.`}
      />
      <dl className="divide-y divide-sand-light text-sm">
        <div className="flex justify-between py-1.5">
          <dt>Per kg{estimate}</dt>
          <dd className="figures text-right font-semibold" data-testid="cost-per-kg">
            {cost.ok ? money(cost.ingredientCostPerKg, currency) : "—"}
          </dd>
        </div>
        <div className="flex justify-between py-1.5">
          <dt>
            Per bar of {barMassGrams} g{estimate}
          </dt>
          <dd className="figures text-right text-lg font-bold" data-testid="cost-per-bar">
            {cost.ok ? money(cost.costPerBar, currency, 3) : "—"}
          </dd>
        </div>
      </dl>
      {cost.ok ? null : (
        <p className="mt-2 text-sm text-cocoa-700">
          {cost.reason} Prices come from each ingredient&apos;s preferred supplier and its current quote.
        </p>
      )}
      {pickable.length ? (
        <div className="mt-4 space-y-3 border-t border-sand-light pt-4">
          {pickable.map((i) => (
            <LotSourcePicker
              key={i.id}
              ingredientId={i.id}
              name={i.name}
              value={choices[i.id] ?? PREFERRED}
              sources={lotSources}
              currency={currency}
              onChange={(lotId) => choose(i.id, lotId)}
            />
          ))}
        </div>
      ) : null}
      {onBarMass ? (
        <div className="mt-4 max-w-40">
          <Field id="bar-mass" label="Bar mass" error={error}>
            <NumberField
              id="bar-mass"
              unit="g"
              value={text ?? barMassGrams}
              aria-invalid={error ? true : undefined}
              onChange={(e) => {
                setText(e.target.value);
                const t = e.target.value.trim();
                if (GRAMS.test(t) && Number(t) > 0) onBarMass(t);
              }}
              onBlur={() => {
                if (!error) setText(null);
              }}
            />
          </Field>
        </div>
      ) : null}
    </Card>
  );
}
