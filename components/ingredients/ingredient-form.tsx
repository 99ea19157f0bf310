"use client";

import { useRouter } from "next/navigation";
import { useState } from "react";
import { createIngredientAction, updateIngredientAction } from "@/app/(app)/ingredients/actions";
import { FormAlert } from "@/components/forms/form-alert";
import { useActionForm } from "@/components/forms/use-action-form";
import { Button } from "@/components/ui/button";
import { Field } from "@/components/ui/field";
import { Input } from "@/components/ui/input";
import { NumberField } from "@/components/ui/number-field";
import { Select } from "@/components/ui/select";
import type { IngredientRecord } from "@/lib/data/ingredients";
import { ALLERGENS } from "@/lib/ingredients/allergens";
import { COMPOSITION_FIELDS, kindOptions, NUTRIENT_FIELDS } from "@/lib/ingredients/kinds";
import { compositionTotal } from "./composition-total";

const textareaClass = "min-h-24 w-full rounded-lg border border-sand bg-white px-3 py-2 text-cocoa focus:border-pod focus:outline-none focus:ring-2 focus:ring-pod/30";

/** Create or edit an ingredient's profile; the composition total and its "other" remainder update as you type. */
export function IngredientForm({ ingredient }: { ingredient?: IngredientRecord }) {
  const router = useRouter();
  const [composition, setComposition] = useState<Record<string, string>>(
    Object.fromEntries(COMPOSITION_FIELDS.map((f) => [f.key, ingredient ? ingredient[f.key] : ""])),
  );
  const [allergens, setAllergens] = useState<string[]>(ingredient?.allergens ?? []);
  const action = ingredient ? updateIngredientAction : createIngredientAction;
  const form = useActionForm<{ id: string } | void>(action, (data) => {
    router.push(`/ingredients/${ingredient?.id ?? (data as { id: string }).id}`);
    router.refresh();
  });
  const sum = compositionTotal(composition);
  const err = form.error;
  return (
    <form onSubmit={form.onSubmit} className="space-y-8" noValidate>
      <FormAlert result={form.result?.ok ? null : form.result} />
      {ingredient ? <input type="hidden" name="ingredientId" value={ingredient.id} /> : null}
      <section className="grid gap-4 md:grid-cols-[1fr_16rem]">
        <Field id="name" label="Name" error={err("name")}>
          <Input id="name" name="name" defaultValue={ingredient?.name} aria-invalid={!!err("name")} required />
        </Field>
        <Field id="kind" label="Kind" error={err("kind")}>
          <Select id="kind" name="kind" defaultValue={ingredient?.kind ?? "other"} options={kindOptions} ariaLabel="Kind" />
        </Field>
        <label className="flex items-center gap-2 text-sm text-cocoa-700 md:col-span-2">
          <input type="checkbox" name="isInclusion" defaultChecked={ingredient?.isInclusion} className="size-4 accent-pod" />
          An inclusion (nuts, fruit, nibs on top): the standards check deducts it before its minimums.
        </label>
      </section>

      <fieldset className="space-y-3">
        <legend className="text-lg font-bold">Composition, g per 100 g</legend>
        <p className="text-sm text-cocoa-500">What the standards check and the bench count. Empty means 0; whatever is left of 100 g is “other”.</p>
        <div className="grid gap-4 sm:grid-cols-2 lg:grid-cols-4">
          {COMPOSITION_FIELDS.map((f) => (
            <Field key={f.key} id={f.key} label={f.label} error={err(f.key)}>
              <NumberField
                id={f.key}
                name={f.key}
                unit="g"
                value={composition[f.key] ?? ""}
                onChange={(e) => setComposition((c) => ({ ...c, [f.key]: e.target.value }))}
                aria-invalid={!!err(f.key)}
              />
            </Field>
          ))}
          <div className="flex flex-col justify-end rounded-lg bg-cream-deep px-3 py-2 text-sm" data-testid="composition-total">
            <span className="font-semibold">Other: {sum ? `${sum.other} g` : "—"}</span>
            <span className={sum?.over ? "text-brick" : "text-cocoa-500"}>Total {sum ? `${sum.total} g` : "—"} of 100 g</span>
          </div>
        </div>
        {err("composition") ? (
          <p role="alert" className="text-sm text-brick">
            {err("composition")}
          </p>
        ) : null}
      </fieldset>

      <fieldset className="space-y-3">
        <legend className="text-lg font-bold">Nutrients, g per 100 g</legend>
        <p className="text-sm text-cocoa-500">For the nutrition declaration later; leave empty when not known.</p>
        <div className="grid gap-4 sm:grid-cols-2 lg:grid-cols-4">
          {NUTRIENT_FIELDS.map((f) => (
            <Field key={f.key} id={f.key} label={f.label} error={err(f.key)}>
              <NumberField id={f.key} name={f.key} unit="g" defaultValue={ingredient?.[f.key] ?? ""} aria-invalid={!!err(f.key)} />
            </Field>
          ))}
        </div>
      </fieldset>

      <fieldset className="space-y-3">
        <legend className="text-lg font-bold">Allergens</legend>
        <p className="text-sm text-cocoa-500">
          The substances of Regulation (EU) No 1169/2011 Annex II. Check the supplier&apos;s spec sheet and your local rules; cross-contact
          is not recorded here.
        </p>
        <input type="hidden" name="allergens" value={allergens.join(",")} />
        <div className="grid gap-2 sm:grid-cols-2 lg:grid-cols-3">
          {ALLERGENS.map((a) => (
            <label key={a.code} className="flex items-center gap-2 text-sm">
              <input
                type="checkbox"
                className="size-4 accent-pod"
                checked={allergens.includes(a.code)}
                onChange={(e) => setAllergens((list) => (e.target.checked ? [...list, a.code] : list.filter((c) => c !== a.code)))}
              />
              {a.label}
            </label>
          ))}
        </div>
        {err("allergens") ? <p className="text-sm text-brick">{err("allergens")}</p> : null}
      </fieldset>

      <section className="grid gap-4 md:grid-cols-2">
        <Field id="source" label="Source of the figures" hint="A spec sheet, a lab report, a food composition table…" error={err("source")}>
          <Input id="source" name="source" defaultValue={ingredient?.source ?? ""} />
        </Field>
        <Field id="notes" label="Notes" error={err("notes")}>
          <textarea id="notes" name="notes" defaultValue={ingredient?.notes ?? ""} className={textareaClass} />
        </Field>
      </section>

      <div className="flex gap-3">
        <Button type="submit" disabled={form.pending}>
          {form.pending ? "Saving…" : ingredient ? "Save profile" : "Add ingredient"}
        </Button>
        <Button type="button" variant="secondary" onClick={() => router.back()}>
          Cancel
        </Button>
      </div>
    </form>
  );
}
