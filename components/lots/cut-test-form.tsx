"use client";

import { useActionState } from "react";
import { recordCutTestAction } from "@/app/(app)/lots/actions";
import { FormAlert, fieldError } from "@/components/forms/form-alert";
import { Button } from "@/components/ui/button";
import { Field } from "@/components/ui/field";
import { Input } from "@/components/ui/input";
import { NumberField } from "@/components/ui/number-field";
import { cutTestCategories } from "./cut-test-table";

export function CutTestForm({ lotId }: { lotId: string }) {
  const [result, action, pending] = useActionState(recordCutTestAction, null);
  const err = (f: string) => fieldError(result, f);
  return (
    <form action={action} className="space-y-4" noValidate aria-label="Record a cut test">
      <h3 className="font-bold">Record a cut test</h3>
      <FormAlert result={result?.ok ? { ok: true, message: "Cut test recorded." } : result} />
      <input type="hidden" name="lotId" value={lotId} />
      <div className="grid gap-4 sm:grid-cols-2">
        <Field id="testedOn" label="Date" error={err("testedOn")}>
          <Input id="testedOn" name="testedOn" type="date" defaultValue={new Date().toISOString().slice(0, 10)} />
        </Field>
        <Field id="sampleSize" label="Beans cut" error={err("sampleSize")}>
          <NumberField id="sampleSize" name="sampleSize" unit="beans" defaultValue="100" />
        </Field>
        {cutTestCategories.map(([key, label]) => (
          <Field key={key} id={key} label={label} error={err(key)}>
            <NumberField id={key} name={key} unit="beans" defaultValue="0" />
          </Field>
        ))}
      </div>
      <Field id="cutNotes" label="Notes">
        <Input id="cutNotes" name="notes" />
      </Field>
      <Button type="submit" disabled={pending}>
        {pending ? "Saving…" : "Save cut test"}
      </Button>
    </form>
  );
}
