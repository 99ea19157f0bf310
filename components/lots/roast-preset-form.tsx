"use client";

import { useActionState } from "react";
import { createRoastPresetAction } from "@/app/(app)/lots/actions";
import { FormAlert, fieldError } from "@/components/forms/form-alert";
import { Button } from "@/components/ui/button";
import { Field } from "@/components/ui/field";
import { Input } from "@/components/ui/input";
import { NumberField } from "@/components/ui/number-field";

export function RoastPresetForm() {
  const [result, action, pending] = useActionState(createRoastPresetAction, null);
  const err = (f: string) => fieldError(result, f);
  return (
    <form action={action} className="grid gap-4 sm:grid-cols-4 sm:items-end" noValidate>
      <div className="sm:col-span-4">
        <FormAlert result={result?.ok ? { ok: true, message: "Preset saved." } : result} />
      </div>
      <Field id="presetName" label="Name" error={err("name")}>
        <Input id="presetName" name="name" />
      </Field>
      <Field id="temperatureC" label="Temperature" error={err("temperatureC")}>
        <NumberField id="temperatureC" name="temperatureC" unit="°C" />
      </Field>
      <Field id="minutes" label="Time" error={err("minutes")}>
        <NumberField id="minutes" name="minutes" unit="min" />
      </Field>
      <Button type="submit" disabled={pending}>
        Save preset
      </Button>
      <div className="sm:col-span-4">
        <Field id="presetNotes" label="Notes">
          <Input id="presetNotes" name="notes" />
        </Field>
      </div>
    </form>
  );
}
