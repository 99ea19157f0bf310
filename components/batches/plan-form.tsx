"use client";

import { useRouter } from "next/navigation";
import { useActionState, useEffect, useState } from "react";
import { planBatchAction } from "@/app/(app)/batches/actions";
import { FormAlert, fieldError } from "@/components/forms/form-alert";
import { Button } from "@/components/ui/button";
import { Card, CardHeader } from "@/components/ui/card";
import { Field } from "@/components/ui/field";
import { Input } from "@/components/ui/input";
import { NumberField } from "@/components/ui/number-field";
import { Select } from "@/components/ui/select";
import { PlanPreview } from "./plan-preview";
import { useBatchPreview } from "./use-batch-preview";

type Option = { value: string; label: string };
const NONE = "none";

const UNIT_OPTIONS: Option[] = [
  { value: "kg", label: "kg" },
  { value: "g", label: "g" },
  { value: "t", label: "t" },
  { value: "bars", label: "bars" },
];

/** Plans a batch: what, how much, on which machine and scale; the engine's masses preview as you type. */
export function PlanForm({
  recipes,
  stations,
  machines,
  presets,
  today,
}: {
  recipes: Option[];
  stations: Option[];
  machines: Option[];
  presets: Option[];
  today: string;
}) {
  const router = useRouter();
  const [result, action, pending] = useActionState(planBatchAction, null);
  const [fields, setFields] = useState({ recipeId: "", amount: "", unit: "kg", stationId: stations[0]?.value ?? "", machineId: NONE });
  const [preset, setPreset] = useState(NONE);
  const set = (k: keyof typeof fields) => (v: string) => setFields((f) => ({ ...f, [k]: v }));
  const { result: preview, loading } = useBatchPreview({ ...fields, machineId: fields.machineId === NONE ? "" : fields.machineId });
  useEffect(() => {
    if (result?.ok) router.push(`/batches/${result.data.id}`);
  }, [result, router]);
  const err = (f: string) => fieldError(result, f);
  return (
    <div className="grid grid-cols-1 gap-6 lg:grid-cols-[minmax(0,1fr)_24rem]">
      <form action={action} className="space-y-5" noValidate aria-label="Plan a batch">
        <FormAlert result={result?.ok ? null : result} />
        <Field id="recipeId" label="Recipe (released version)" error={err("recipeId")}>
          <Select id="recipeId" name="recipeId" ariaLabel="Recipe" placeholder="Choose a released recipe…" options={recipes} value={fields.recipeId} onValueChange={set("recipeId")} />
        </Field>
        <div className="grid gap-4 sm:grid-cols-[1fr_8rem]">
          <Field id="amount" label="Batch size" hint="A mass, or a number of bars of the version's bar mass." error={err("amount")}>
            <NumberField id="amount" name="amount" unit={fields.unit} value={fields.amount} onChange={(e) => set("amount")(e.target.value)} />
          </Field>
          <Field id="unit" label="Unit" error={err("unit")}>
            <Select id="unit" name="unit" ariaLabel="Unit" options={UNIT_OPTIONS} value={fields.unit} onValueChange={set("unit")} />
          </Field>
        </div>
        <div className="grid gap-4 sm:grid-cols-2">
          <Field id="machineId" label="Split into loads of" error={err("machineId")}>
            <Select id="machineId" ariaLabel="Machine" options={[{ value: NONE, label: "One load" }, ...machines]} value={fields.machineId} onValueChange={set("machineId")} />
            <input type="hidden" name="machineId" value={fields.machineId === NONE ? "" : fields.machineId} />
          </Field>
          <Field id="stationId" label="Weighing station" error={err("stationId")}>
            <Select id="stationId" name="stationId" ariaLabel="Weighing station" placeholder="Choose a scale…" options={stations} value={fields.stationId} onValueChange={set("stationId")} />
          </Field>
          <Field id="plannedFor" label="Planned for" error={err("plannedFor")}>
            <Input id="plannedFor" name="plannedFor" type="date" defaultValue={today} />
          </Field>
          <Field id="roastPresetId" label="Roast profile" error={err("roastPresetId")}>
            <Select id="roastPresetId" ariaLabel="Roast profile" options={[{ value: NONE, label: "Not set" }, ...presets]} value={preset} onValueChange={setPreset} />
            <input type="hidden" name="roastPresetId" value={preset === NONE ? "" : preset} />
          </Field>
          <Field id="refiningHours" label="Refining time" hint="Optional; from your own process." error={err("refiningHours")}>
            <NumberField id="refiningHours" name="refiningHours" unit="h" />
          </Field>
          <Field id="conchingHours" label="Conching time" hint="Optional; typically 6–72 h." error={err("conchingHours")}>
            <NumberField id="conchingHours" name="conchingHours" unit="h" />
          </Field>
        </div>
        <Field id="notes" label="Notes" error={err("notes")}>
          <Input id="notes" name="notes" />
        </Field>
        <Button type="submit" disabled={pending}>
          {pending ? "Planning…" : "Plan batch"}
        </Button>
      </form>
      <Card aria-live="polite">
        <CardHeader title="Preview" description="The engine's masses, in whole scale steps, adding up to the batch exactly." />
        {!preview ? (
          <p className="text-sm text-cocoa-500">{loading ? "Scaling…" : "Choose a recipe and a size to see the masses."}</p>
        ) : preview.ok ? (
          <PlanPreview preview={preview.preview} />
        ) : (
          <p className="rounded-md bg-brick-light px-3 py-2 text-sm text-brick" data-testid="preview-error">
            {preview.message}
          </p>
        )}
      </Card>
    </div>
  );
}
