"use client";

import { useActionState, useState } from "react";
import { recordProcessingAction } from "@/app/(app)/lots/actions";
import { FormAlert, fieldError } from "@/components/forms/form-alert";
import { Button } from "@/components/ui/button";
import { Field } from "@/components/ui/field";
import { Input } from "@/components/ui/input";
import { NumberField } from "@/components/ui/number-field";
import { Select } from "@/components/ui/select";
import { celsiusToFahrenheit } from "@/lib/formulation";

type Preset = { id: string; name: string; temperatureC: string; minutes: string };
type Step = "sorting" | "roasting" | "winnowing";

const today = () => new Date().toISOString().slice(0, 10);

/** Records one step. A fresh submission key per filled-in form makes a double click record once. */
export function ProcessingForm({ lotId, presets }: { lotId: string; presets: Preset[] }) {
  const [key, setKey] = useState(() => crypto.randomUUID());
  const [result, action, pending] = useActionState(async (prev: unknown, formData: FormData) => {
    const r = await recordProcessingAction(prev, formData);
    // A saved record gets a new key, so the next one is a new record; a failed one keeps it.
    if (r.ok) setKey(crypto.randomUUID());
    return r;
  }, null);
  const [step, setStep] = useState<Step>("sorting");
  const [temperature, setTemperature] = useState("");
  const [minutes, setMinutes] = useState("");
  const err = (f: string) => fieldError(result, f);
  const fahrenheit = temperature ? celsiusToFahrenheit(temperature.replace(",", ".")) : null;
  const shown = result?.ok
    ? { ok: true, message: result.data.created ? "Recorded." : "Already recorded — this form had been sent before." }
    : result;
  return (
    <form action={action} className="space-y-4" noValidate aria-label="Record a processing step">
      <h3 className="font-bold">Record a step</h3>
      <FormAlert result={shown} />
      <input type="hidden" name="lotId" value={lotId} />
      <input type="hidden" name="submissionKey" value={key} />
      <div className="grid gap-4 md:grid-cols-4">
        <Field id="step" label="Step">
          <Select id="step" name="step" value={step} onValueChange={(v) => setStep(v as Step)} ariaLabel="Step"
            options={[{ value: "sorting", label: "Sorting" }, { value: "roasting", label: "Roasting" }, { value: "winnowing", label: "Cracking and winnowing" }]} />
        </Field>
        <Field id="performedOn" label="Date" error={err("performedOn")}>
          <Input id="performedOn" name="performedOn" type="date" defaultValue={today()} />
        </Field>
        <Field id="massInKg" label="Mass in" error={err("massInKg")}>
          <NumberField id="massInKg" name="massInKg" unit="kg" />
        </Field>
        <Field id="massOutKg" label={step === "sorting" ? "Beans kept" : step === "roasting" ? "Roasted beans" : "Nibs"} error={err("massOutKg")}>
          <NumberField id="massOutKg" name="massOutKg" unit="kg" />
        </Field>
        {step === "sorting" ? (
          <Field id="rejectsKg" label="Rejects" hint="Flat, broken, mouldy beans, stems, stones." error={err("rejectsKg")}>
            <NumberField id="rejectsKg" name="rejectsKg" unit="kg" />
          </Field>
        ) : null}
        {step === "winnowing" ? (
          <>
            <Field id="shellKg" label="Shell" error={err("shellKg")}>
              <NumberField id="shellKg" name="shellKg" unit="kg" />
            </Field>
            <Field id="dustKg" label="Dust and loss" error={err("dustKg")}>
              <NumberField id="dustKg" name="dustKg" unit="kg" />
            </Field>
          </>
        ) : null}
        {step === "roasting" ? (
          <>
            {presets.length > 0 ? (
              <Field id="roastPresetId" label="Roast preset">
                <Select id="roastPresetId" name="roastPresetId" ariaLabel="Roast preset" placeholder="None"
                  options={presets.map((p) => ({ value: p.id, label: `${p.name} (${p.temperatureC} °C, ${p.minutes} min)` }))}
                  onValueChange={(id) => {
                    const p = presets.find((x) => x.id === id);
                    if (p) {
                      setTemperature(p.temperatureC);
                      setMinutes(p.minutes);
                    }
                  }} />
              </Field>
            ) : null}
            <Field id="roastTemperatureC" label="Temperature" hint={fahrenheit ? `= ${Number(fahrenheit).toFixed(1)} °F` : undefined} error={err("roastTemperatureC")}>
              <NumberField id="roastTemperatureC" name="roastTemperatureC" unit="°C" value={temperature} onChange={(e) => setTemperature(e.target.value)} />
            </Field>
            <Field id="roastMinutes" label="Time" error={err("roastMinutes")}>
              <NumberField id="roastMinutes" name="roastMinutes" unit="min" value={minutes} onChange={(e) => setMinutes(e.target.value)} />
            </Field>
            <Field id="ovenLoadKg" label="Oven load" error={err("ovenLoadKg")}>
              <NumberField id="ovenLoadKg" name="ovenLoadKg" unit="kg" />
            </Field>
          </>
        ) : null}
        <Field id="cost" label="Cost of the step" hint="Labour and energy, in the base currency (optional)." error={err("cost")}>
          <NumberField id="cost" name="cost" unit="" />
        </Field>
      </div>
      {step === "roasting" ? (
        <p className="rounded-md bg-pod-light px-3 py-2 text-sm text-pod-dark" role="note">
          Roasting is also a food-safety step for raw cocoa beans. Follow your validated process and the food-safety rules
          that apply where you make chocolate; the usual craft range (120–140 °C, 15–40 min) is common practice, not a
          safety validation.
        </p>
      ) : null}
      <Field id="notes" label="Notes" error={err("notes")}>
        <Input id="notes" name="notes" />
      </Field>
      <Button type="submit" disabled={pending}>
        {pending ? "Recording…" : "Record step"}
      </Button>
    </form>
  );
}
