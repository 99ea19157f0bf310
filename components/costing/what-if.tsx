"use client";

import { useState } from "react";
import { Field } from "@/components/ui/field";
import { NumberField } from "@/components/ui/number-field";
import { whatIf, type Choice, type CostLine, type CostSettings } from "@/lib/costing";
import { formatPercent } from "@/lib/format";
import { whatIfPriceSchema } from "@/lib/validation/what-if";
import { cents, marginOrReason, perBar } from "./figures";

type Props = {
  base: { lines: readonly CostLine[]; choices: readonly Choice[]; settings: CostSettings; barMassGrams: string };
  ingredientId: string;
  name: string;
  basePerKg: string | null;
  currency: string;
};

/** A new price per kg for one ingredient, tried on the chosen combination; nothing is saved. */
export function WhatIf({ base, ingredientId, name, basePerKg, currency }: Props) {
  const [text, setText] = useState("");
  const parsed = text.trim() === "" ? null : whatIfPriceSchema.safeParse(text);
  const error = parsed && !parsed.success ? parsed.error.issues[0]?.message : undefined;
  const result = parsed?.success ? whatIf(base, ingredientId, parsed.data) : null;
  return (
    <div className="mt-6 grid gap-4 border-t border-sand-light pt-4 md:grid-cols-[16rem_1fr]">
      <Field id="what-if-price" label={`What if ${name} cost`} hint={basePerKg ? `Now ${cents(basePerKg, currency)}/kg. Nothing is saved.` : undefined} error={error}>
        <NumberField id="what-if-price" unit={`${currency}/kg`} value={text} onChange={(e) => setText(e.target.value)} aria-invalid={error ? true : undefined} className="pr-20" />
      </Field>
      {result?.ok ? (
        <dl className="grid grid-cols-2 gap-x-6 gap-y-1 self-end text-sm" data-testid="what-if-result">
          <dt>Price change</dt>
          <dd className="figures text-right">{result.changePercent === null ? "—" : `${result.changePercent.startsWith("-") ? "" : "+"}${formatPercent(result.changePercent, 1)}`}</dd>
          <dt>Cost per bar</dt>
          <dd className="figures text-right font-semibold" data-testid="what-if-per-bar">
            {result.before.cost.ok ? perBar(result.before.cost.costPerBar, currency) : "—"} → {result.after.cost.ok ? perBar(result.after.cost.costPerBar, currency) : "—"}
          </dd>
          <dt>Wholesale margin</dt>
          <dd className="figures text-right">
            {marginOrReason(result.before.margins?.wholesaleMargin ?? null, "no price set")} → {marginOrReason(result.after.margins?.wholesaleMargin ?? null, "no price set")}
          </dd>
          <dt>Retail margin</dt>
          <dd className="figures text-right">
            {marginOrReason(result.before.margins?.retailMargin ?? null, "no price set")} → {marginOrReason(result.after.margins?.retailMargin ?? null, "no price set")}
          </dd>
        </dl>
      ) : result && !result.ok ? (
        <p className="self-end text-sm text-brick">{result.reason}</p>
      ) : null}
    </div>
  );
}
