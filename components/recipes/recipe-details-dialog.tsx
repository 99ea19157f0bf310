"use client";

import { useActionState, useState } from "react";
import { updateRecipeDetailsAction } from "@/app/(app)/recipes/[recipeId]/actions";
import { FormAlert, fieldError } from "@/components/forms/form-alert";
import { Button } from "@/components/ui/button";
import { Dialog } from "@/components/ui/dialog";
import { Field } from "@/components/ui/field";
import { Input } from "@/components/ui/input";
import { NumberField } from "@/components/ui/number-field";
import { Select } from "@/components/ui/select";
import { CHOCOLATE_TYPE_OPTIONS } from "./chocolate-types";

type Details = { id: string; name: string; chocolateType: string; targetCocoaPercent: string | null; notes: string | null };

/** Name, type, target and notes: details of the recipe, not of a version. */
export function RecipeDetailsDialog({ recipe }: { recipe: Details }) {
  const [open, setOpen] = useState(false);
  const [result, action, pending] = useActionState(async (prev: unknown, form: FormData) => {
    const r = await updateRecipeDetailsAction(prev, form);
    if (r.ok) setOpen(false);
    return r;
  }, null);
  return (
    <Dialog
      open={open}
      onOpenChange={setOpen}
      title="Recipe details"
      description="These are not versioned: a change applies to the recipe as a whole."
      trigger={<Button variant="secondary">Details</Button>}
    >
      <form action={action} className="space-y-4" noValidate>
        <FormAlert result={result?.ok ? null : result} />
        <input type="hidden" name="recipeId" value={recipe.id} />
        <Field id="details-name" label="Name" error={fieldError(result, "name")}>
          <Input id="details-name" name="name" defaultValue={recipe.name} required />
        </Field>
        <div className="grid grid-cols-2 gap-3">
          <Field id="details-type" label="Type" error={fieldError(result, "chocolateType")}>
            <Select id="details-type" name="chocolateType" ariaLabel="Type" defaultValue={recipe.chocolateType} options={CHOCOLATE_TYPE_OPTIONS} />
          </Field>
          <Field id="details-target" label="Target cocoa" error={fieldError(result, "targetCocoaPercent")}>
            <NumberField id="details-target" name="targetCocoaPercent" unit="%" defaultValue={recipe.targetCocoaPercent ? String(Number(recipe.targetCocoaPercent)) : ""} />
          </Field>
        </div>
        <Field id="details-notes" label="Notes" error={fieldError(result, "notes")}>
          <textarea id="details-notes" name="notes" defaultValue={recipe.notes ?? ""} rows={4} className="w-full rounded-lg border border-sand bg-white p-3" />
        </Field>
        <div className="flex justify-end">
          <Button type="submit" disabled={pending}>
            {pending ? "Saving…" : "Save details"}
          </Button>
        </div>
      </form>
    </Dialog>
  );
}
