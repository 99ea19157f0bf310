"use client";

import { useState, useTransition } from "react";
import { saveCostSettingsAction } from "@/app/(app)/costing/actions";
import { FormAlert, fieldError } from "@/components/forms/form-alert";
import { Button } from "@/components/ui/button";
import { Field } from "@/components/ui/field";
import { Input } from "@/components/ui/input";
import { NumberField } from "@/components/ui/number-field";
import type { CostSettings } from "@/lib/costing";

type FieldSpec = { name: keyof CostSettings; label: string; unit: string; hint?: string };

const GROUPS: { title: string; fields: FieldSpec[] }[] = [
  {
    title: "Making",
    fields: [
      { name: "processLossPercent", label: "Process loss", unit: "%", hint: "Chocolate lost in refining, tempering and moulding." },
      { name: "packagingPerBar", label: "Packaging per bar", unit: "/bar", hint: "Wrapper, box, label." },
      { name: "barsPerCase", label: "Bars per case", unit: "bars" },
    ],
  },
  {
    title: "Labour and overhead",
    fields: [
      { name: "labourPerKg", label: "Labour per kg", unit: "/kg", hint: "Per kg of finished chocolate." },
      { name: "labourPerBar", label: "Labour per bar", unit: "/bar", hint: "Wrapping by hand, for example." },
      { name: "overheadPerKg", label: "Overhead per kg", unit: "/kg", hint: "Rent, energy, machines, per kg made." },
      { name: "overheadPerBar", label: "Overhead per bar", unit: "/bar" },
    ],
  },
  {
    title: "Selling",
    fields: [
      { name: "wholesaleMarginPercent", label: "Wholesale target margin", unit: "%", hint: "Of the selling price. Empty: none." },
      { name: "wholesalePricePerBar", label: "Wholesale price", unit: "/bar", hint: "Empty: none." },
      { name: "retailMarginPercent", label: "Retail target margin", unit: "%" },
      { name: "retailPricePerBar", label: "Retail price", unit: "/bar", hint: "Without sales tax." },
    ],
  },
  {
    title: "Buying",
    fields: [
      { name: "batchKg", label: "Batch size", unit: "kg", hint: "Ingredients per batch, to check minimum orders." },
      { name: "needWithinDays", label: "Need within", unit: "days", hint: "To check suppliers' lead times." },
    ],
  },
];

const asText = (s: CostSettings) => Object.fromEntries(Object.entries(s).map(([k, v]) => [k, v === null ? "" : String(v)])) as Record<keyof CostSettings, string>;

/** The recipe's cost model as a form (read-only for those who may not change it); every save is a new revision. */
export function CostSettingsForm({ recipeId, settings, revision, currency, canEdit }: { recipeId: string; settings: CostSettings; revision: number; currency: string; canEdit: boolean }) {
  const [values, setValues] = useState(() => asText(settings));
  const [note, setNote] = useState("");
  const [expected, setExpected] = useState(revision);
  const [result, setResult] = useState<Awaited<ReturnType<typeof saveCostSettingsAction>> | null>(null);
  const [pending, start] = useTransition();
  const submit = (e: React.FormEvent) => {
    e.preventDefault();
    start(async () => {
      const r = await saveCostSettingsAction({ ...values, recipeId, expectedRevision: String(expected), note });
      setResult(r);
      if (r.ok) {
        setExpected(r.data.revision);
        setNote("");
      }
    });
  };
  const unitFor = (f: FieldSpec) => (f.unit.startsWith("/") ? `${currency}${f.unit}` : f.unit);
  return (
    <form onSubmit={submit} noValidate aria-label="Cost settings" className="space-y-6">
      <FormAlert result={result?.ok ? { ok: true, message: `Saved as revision ${result.data.revision}.` } : result} />
      <fieldset disabled={!canEdit || pending} className="grid grid-cols-1 gap-6 lg:grid-cols-2">
        {GROUPS.map((g) => (
          <div key={g.title} className="space-y-3">
            <h3 className="text-sm font-bold uppercase tracking-wide text-cocoa-500">{g.title}</h3>
            <div className="grid gap-3 sm:grid-cols-2">
              {g.fields.map((f) => (
                <Field key={f.name} id={`cost-${f.name}`} label={f.label} hint={f.hint} error={fieldError(result, f.name)}>
                  <NumberField
                    id={`cost-${f.name}`}
                    name={f.name}
                    unit={unitFor(f)}
                    value={values[f.name]}
                    onChange={(e) => setValues((v) => ({ ...v, [f.name]: e.target.value }))}
                    aria-invalid={fieldError(result, f.name) ? true : undefined}
                    className="pr-20"
                  />
                </Field>
              ))}
            </div>
          </div>
        ))}
      </fieldset>
      {canEdit ? (
        <div className="flex flex-wrap items-end gap-3">
          <div className="min-w-64 flex-1">
            <Field id="cost-note" label="What changed (optional)" error={fieldError(result, "note")}>
              <Input id="cost-note" value={note} maxLength={300} onChange={(e) => setNote(e.target.value)} placeholder="New wrapper supplier" />
            </Field>
          </div>
          <Button type="submit" disabled={pending}>
            {pending ? "Saving…" : "Save cost settings"}
          </Button>
        </div>
      ) : (
        <p className="text-sm text-cocoa-500">Only the owner and the buyer change these figures.</p>
      )}
    </form>
  );
}
