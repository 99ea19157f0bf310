"use client";

import { useRouter } from "next/navigation";
import { useActionState, useEffect, useState } from "react";
import { createRecipeAction } from "@/app/(app)/recipes/actions";
import { FormAlert, fieldError } from "@/components/forms/form-alert";
import { Button } from "@/components/ui/button";
import { Field } from "@/components/ui/field";
import { Input } from "@/components/ui/input";
import { NumberField } from "@/components/ui/number-field";
import { Select } from "@/components/ui/select";
import { cn } from "@/lib/cn";
import type { StartingPoint } from "@/lib/recipes/starting-points";
import { CHOCOLATE_TYPE_OPTIONS } from "./chocolate-types";

type Start = "starting_point" | "scratch" | "copy";

/** A new recipe: from one of our starting points, empty, or a copy of another recipe's latest version. */
export function NewRecipeForm({ startingPoints, copyChoices }: { startingPoints: readonly StartingPoint[]; copyChoices: { id: string; name: string; latestVersionNo: number }[] }) {
  const router = useRouter();
  const [result, action, pending] = useActionState(createRecipeAction, null);
  const [start, setStart] = useState<Start>("starting_point");
  const [point, setPoint] = useState(startingPoints[0]!.key);
  const chosen = startingPoints.find((p) => p.key === point)!;
  useEffect(() => {
    if (result?.ok) router.push(`/recipes/${result.data.recipeId}`);
  }, [result, router]);
  const startButton = (value: Start, label: string, hint: string) => (
    <label className={cn("flex cursor-pointer flex-col rounded-lg border p-3", start === value ? "border-pod bg-pod-light" : "border-sand bg-white")}>
      <span className="flex items-center gap-2 font-semibold">
        <input type="radio" name="start" value={value} checked={start === value} onChange={() => setStart(value)} />
        {label}
      </span>
      <span className="mt-1 text-xs text-cocoa-500">{hint}</span>
    </label>
  );
  return (
    <form action={action} className="space-y-6" noValidate>
      <FormAlert result={result?.ok ? null : result} />
      <fieldset className="space-y-3">
        <legend className="text-sm font-semibold text-cocoa-700">Start from</legend>
        <div className="grid gap-3 sm:grid-cols-3">
          {startButton("starting_point", "A starting point", "Our own balanced recipes, ready to tune.")}
          {startButton("scratch", "Nothing", "An empty bench: add ingredients yourself.")}
          {startButton("copy", "Another recipe", "A copy of its latest version.")}
        </div>
        {start === "starting_point" ? (
          <div className="grid gap-3 sm:grid-cols-3" role="radiogroup" aria-label="Starting point">
            {startingPoints.map((p) => (
              <label key={p.key} className={cn("cursor-pointer rounded-lg border p-3 text-sm", point === p.key ? "border-pod bg-white shadow-card" : "border-sand bg-cream")}>
                <span className="flex items-center gap-2 font-semibold">
                  <input type="radio" name="startingPointKey" value={p.key} checked={point === p.key} onChange={() => setPoint(p.key)} />
                  {p.name}
                </span>
                <span className="mt-1 block text-cocoa-500">{p.description}</span>
                <span className="mt-1 block text-xs text-cocoa-500">A Barwright starting point.</span>
              </label>
            ))}
          </div>
        ) : null}
        {start === "copy" ? (
          <Field id="copy-from" label="Recipe to copy" error={fieldError(result, "copyFromRecipeId")}>
            <Select id="copy-from" name="copyFromRecipeId" ariaLabel="Recipe to copy" options={copyChoices.map((c) => ({ value: c.id, label: `${c.name} (v${c.latestVersionNo})` }))} placeholder={copyChoices.length ? "Choose a recipe" : "No recipe has a saved version yet"} />
          </Field>
        ) : null}
      </fieldset>
      <div className="grid gap-4 sm:grid-cols-2">
        <Field id="recipe-name" label="Name" error={fieldError(result, "name")}>
          <Input id="recipe-name" name="name" required maxLength={120} />
        </Field>
        <Field id="recipe-type" label="Type" error={fieldError(result, "chocolateType")}>
          <Select key={start === "starting_point" ? chosen.key : start} id="recipe-type" name="chocolateType" ariaLabel="Type" defaultValue={start === "starting_point" ? chosen.chocolateType : "dark"} options={CHOCOLATE_TYPE_OPTIONS} />
        </Field>
        <Field id="recipe-target" label="Target cocoa" hint="Optional, e.g. 70" error={fieldError(result, "targetCocoaPercent")}>
          <NumberField key={`t-${chosen.key}-${start}`} id="recipe-target" name="targetCocoaPercent" unit="%" defaultValue={start === "starting_point" ? chosen.targetCocoaPercent : ""} />
        </Field>
        <Field id="recipe-bar" label="Bar mass" error={fieldError(result, "barMassGrams")}>
          <NumberField id="recipe-bar" name="barMassGrams" unit="g" defaultValue="70" />
        </Field>
      </div>
      <Field id="recipe-notes" label="Notes" hint="Optional: origin, intent, tasting notes." error={fieldError(result, "notes")}>
        <textarea id="recipe-notes" name="notes" rows={3} maxLength={2000} className="w-full rounded-lg border border-sand bg-white p-3" />
      </Field>
      <Button type="submit" disabled={pending}>
        {pending ? "Creating…" : "Create and open the bench"}
      </Button>
    </form>
  );
}
