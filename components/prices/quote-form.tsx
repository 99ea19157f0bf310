"use client";

import { useRouter } from "next/navigation";
import { useState } from "react";
import { createQuoteAction } from "@/app/(app)/suppliers/actions";
import { refreshLists } from "@/components/data/fetch-json";
import { FormAlert } from "@/components/forms/form-alert";
import { useActionForm } from "@/components/forms/use-action-form";
import { Button } from "@/components/ui/button";
import { Field } from "@/components/ui/field";
import { Input } from "@/components/ui/input";
import { NumberField } from "@/components/ui/number-field";
import { Select, type SelectOption } from "@/components/ui/select";

const unitOptions = [
  { value: "per_kg", label: "per kg" },
  { value: "per_pack", label: "per pack" },
  { value: "per_tonne", label: "per tonne" },
];

/**
 * Records a quote typed in by hand. Either the ingredient or the supplier is
 * fixed by the page; the other is chosen here. A new quote never replaces an
 * old one: history stays.
 */
export function QuoteForm({
  ingredientId,
  supplierId,
  ingredients,
  suppliers,
  defaultCurrency,
  today,
}: {
  ingredientId?: string;
  supplierId?: string;
  ingredients?: SelectOption[];
  suppliers?: (SelectOption & { currency: string })[];
  defaultCurrency: string;
  today: string;
}) {
  const router = useRouter();
  const [unit, setUnit] = useState("per_kg");
  const [currency, setCurrency] = useState(defaultCurrency);
  const form = useActionForm(createQuoteAction, (_d, el) => {
    el.reset();
    setUnit("per_kg");
    void refreshLists("/api/quotes", "/api/ingredients");
    router.refresh();
    return "Quote recorded. Earlier quotes stay in the history.";
  });
  const err = form.error;
  return (
    <form onSubmit={form.onSubmit} className="grid gap-4 md:grid-cols-4" noValidate data-testid="quote-form">
      <div className="md:col-span-4">
        <FormAlert result={form.result} />
      </div>
      {ingredientId ? <input type="hidden" name="ingredientId" value={ingredientId} /> : null}
      {supplierId ? <input type="hidden" name="supplierId" value={supplierId} /> : null}
      {suppliers ? (
        <Field id="q-supplier" label="Supplier" error={err("supplierId")}>
          <Select
            id="q-supplier"
            name="supplierId"
            options={suppliers}
            placeholder="Choose…"
            ariaLabel="Supplier"
            onValueChange={(id) => setCurrency(suppliers.find((s) => s.value === id)?.currency ?? currency)}
          />
        </Field>
      ) : null}
      {ingredients ? (
        <Field id="q-ingredient" label="Ingredient" error={err("ingredientId")}>
          <Select id="q-ingredient" name="ingredientId" options={ingredients} placeholder="Choose…" ariaLabel="Ingredient" />
        </Field>
      ) : null}
      <Field id="q-price" label="Price" error={err("price")}>
        <NumberField id="q-price" name="price" unit={currency} aria-invalid={!!err("price")} />
      </Field>
      <Field id="q-currency" label="Currency" error={err("currency")}>
        <Input id="q-currency" name="currency" value={currency} onChange={(e) => setCurrency(e.target.value.toUpperCase())} maxLength={3} />
      </Field>
      <Field id="q-unit" label="Unit" error={err("unit")}>
        <Select id="q-unit" name="unit" value={unit} onValueChange={setUnit} options={unitOptions} ariaLabel="Unit" />
      </Field>
      <Field id="q-pack" label="Pack size" hint={unit === "per_pack" ? "Needed for a pack price." : "Only for pack prices."} error={err("packKg")}>
        <NumberField id="q-pack" name="packKg" unit="kg" disabled={unit !== "per_pack"} aria-invalid={!!err("packKg")} />
      </Field>
      <Field id="q-moq" label="Minimum order" error={err("minimumOrderKg")}>
        <NumberField id="q-moq" name="minimumOrderKg" unit="kg" />
      </Field>
      <Field id="q-from" label="Valid from" error={err("validFrom")}>
        <Input id="q-from" name="validFrom" type="date" defaultValue={today} aria-invalid={!!err("validFrom")} />
      </Field>
      <Field id="q-until" label="Valid until" hint="Empty = until a newer quote." error={err("validUntil")}>
        <Input id="q-until" name="validUntil" type="date" aria-invalid={!!err("validUntil")} />
      </Field>
      <div className="flex items-end md:col-span-4">
        <Button type="submit" disabled={form.pending}>
          {form.pending ? "Recording…" : "Record quote"}
        </Button>
      </div>
    </form>
  );
}
