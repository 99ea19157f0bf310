"use client";

import { useState, useTransition, type FormEvent } from "react";
import { saveLabelSettingsAction } from "@/app/(app)/recipes/[recipeId]/label/actions";
import { FormAlert, fieldError } from "@/components/forms/form-alert";
import { Button } from "@/components/ui/button";
import { Field } from "@/components/ui/field";
import { Input } from "@/components/ui/input";
import { NumberField } from "@/components/ui/number-field";

type Settings = { mayContain: string | null; piecesPerBar: number | null; euPortionGrams: string | null };
type Result = Awaited<ReturnType<typeof saveLabelSettingsAction>>;

/**
 * The label fields a maker fills in. Submitted without React's form reset, so a refused
 * value stays in its field beside the message.
 */
export function LabelSettingsForm({ recipeId, settings }: { recipeId: string; settings: Settings }) {
  const [result, setResult] = useState<Result | null>(null);
  const [pending, start] = useTransition();
  const err = (f: string) => fieldError(result, f);
  const onSubmit = (event: FormEvent<HTMLFormElement>) => {
    event.preventDefault();
    const data = new FormData(event.currentTarget);
    start(async () => setResult(await saveLabelSettingsAction(null, data)));
  };
  return (
    <form onSubmit={onSubmit} className="space-y-4" noValidate aria-label="Label details">
      <FormAlert result={result?.ok ? { ok: true, message: "Label details saved." } : result} />
      <input type="hidden" name="recipeId" value={recipeId} />
      <Field id="mayContain" label="May contain (cross-contact)" hint="Printed as “May contain …”. Name what shares your equipment or room, e.g. milk, hazelnuts." error={err("mayContain")}>
        <Input id="mayContain" name="mayContain" defaultValue={settings.mayContain ?? ""} maxLength={300} aria-invalid={err("mayContain") ? true : undefined} />
      </Field>
      <div className="grid grid-cols-2 gap-4">
        <Field id="piecesPerBar" label="Pieces per bar" hint="Empty for one block." error={err("piecesPerBar")}>
          <NumberField id="piecesPerBar" name="piecesPerBar" unit="pcs" defaultValue={settings.piecesPerBar ?? ""} aria-invalid={err("piecesPerBar") ? true : undefined} />
        </Field>
        <Field id="euPortionGrams" label="EU portion" hint="Adds a per-portion column." error={err("euPortionGrams")}>
          <NumberField id="euPortionGrams" name="euPortionGrams" unit="g" defaultValue={settings.euPortionGrams ?? ""} aria-invalid={err("euPortionGrams") ? true : undefined} />
        </Field>
      </div>
      <Button type="submit" variant="secondary" disabled={pending}>
        {pending ? "Saving…" : "Save label details"}
      </Button>
    </form>
  );
}
