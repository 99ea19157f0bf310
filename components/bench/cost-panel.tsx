"use client";

import { useState } from "react";
import { Card, CardHeader } from "@/components/ui/card";
import { Field } from "@/components/ui/field";
import { NumberField } from "@/components/ui/number-field";
import { costRecipe, type RecipeLine } from "@/lib/formulation";
import { money } from "@/lib/recipes/format";

const GRAMS = /^\d{1,5}(\.\d{1,2})?$/;

/**
 * Ingredient cost per kg and per bar from each line's price (the preferred
 * supplier's current quote, in base currency), recomputed on every move.
 */
export function CostPanel({
  lines,
  barMassGrams,
  currency,
  onBarMass,
}: {
  lines: RecipeLine[];
  barMassGrams: string;
  currency: string;
  onBarMass?: (grams: string) => void;
}) {
  const [text, setText] = useState<string | null>(null);
  const cost = costRecipe(lines, { barMassGrams });
  const error = text !== null && (!GRAMS.test(text.trim()) || Number(text) <= 0) ? "Enter the bar mass in grams, above 0." : undefined;
  return (
    <Card data-testid="cost-panel">
      <CardHeader title="Cost" description={`Ingredients only, in ${currency}, at today's preferred quotes.`} />
      <dl className="divide-y divide-sand-light text-sm">
        <div className="flex justify-between py-1.5">
          <dt>Per kg</dt>
          <dd className="figures text-right font-semibold" data-testid="cost-per-kg">
            {cost.ok ? money(cost.ingredientCostPerKg, currency) : "—"}
          </dd>
        </div>
        <div className="flex justify-between py-1.5">
          <dt>Per bar of {barMassGrams} g</dt>
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
