"use client";

import { useRouter } from "next/navigation";
import { useActionState, useEffect, useState } from "react";
import { createLotAction } from "@/app/(app)/lots/actions";
import { FormAlert, fieldError } from "@/components/forms/form-alert";
import { Button } from "@/components/ui/button";
import { Field } from "@/components/ui/field";
import { Input } from "@/components/ui/input";
import { NumberField } from "@/components/ui/number-field";
import { Select } from "@/components/ui/select";

type SupplierOption = { value: string; label: string; currency: string };

export function NewLotForm({ suppliers, baseCurrency }: { suppliers: SupplierOption[]; baseCurrency: string }) {
  const router = useRouter();
  const [result, action, pending] = useActionState(createLotAction, null);
  const [currency, setCurrency] = useState(baseCurrency);
  useEffect(() => {
    if (result?.ok) router.push(`/lots/${result.data.id}`);
  }, [result, router]);
  const err = (f: string) => fieldError(result, f);
  return (
    <form action={action} className="space-y-5" noValidate>
      <FormAlert result={result?.ok ? null : result} />
      <div className="grid gap-4 sm:grid-cols-2">
        <Field id="code" label="Lot code" error={err("code")}>
          <Input id="code" name="code" placeholder="EC-2026-07" />
        </Field>
        <Field id="supplierId" label="Supplier" error={err("supplierId")}>
          <Select id="supplierId" name="supplierId" ariaLabel="Supplier" placeholder="Choose…" options={suppliers}
            onValueChange={(id) => setCurrency(suppliers.find((s) => s.value === id)?.currency ?? currency)} />
        </Field>
        <Field id="originCountry" label="Country" error={err("originCountry")}>
          <Input id="originCountry" name="originCountry" placeholder="Ecuador" />
        </Field>
        <Field id="originRegion" label="Region" error={err("originRegion")}>
          <Input id="originRegion" name="originRegion" />
        </Field>
        <Field id="producer" label="Farm or cooperative" error={err("producer")}>
          <Input id="producer" name="producer" />
        </Field>
        <Field id="harvestYear" label="Harvest year" error={err("harvestYear")}>
          <Input id="harvestYear" name="harvestYear" inputMode="numeric" />
        </Field>
        <Field id="arrivedOn" label="Arrived on" error={err("arrivedOn")}>
          <Input id="arrivedOn" name="arrivedOn" type="date" defaultValue={new Date().toISOString().slice(0, 10)} />
        </Field>
        <Field id="massReceivedKg" label="Mass received" error={err("massReceivedKg")}>
          <NumberField id="massReceivedKg" name="massReceivedKg" unit="kg" />
        </Field>
        <Field id="pricePaid" label="Price paid for the beans" error={err("pricePaid")}>
          <NumberField id="pricePaid" name="pricePaid" unit={currency} />
        </Field>
        <Field id="currency" label="Currency" hint="ISO 4217 code; converted to the base currency at the arrival date's rate." error={err("currency")}>
          <Input id="currency" name="currency" value={currency} onChange={(e) => setCurrency(e.target.value.toUpperCase())} maxLength={3} />
        </Field>
        <Field id="freight" label="Freight" error={err("freight")}>
          <NumberField id="freight" name="freight" unit={currency} />
        </Field>
        <Field id="duty" label="Duty" error={err("duty")}>
          <NumberField id="duty" name="duty" unit={currency} />
        </Field>
        <Field id="moisturePercent" label="Moisture on arrival" hint="Usually 6–8 % (common practice)." error={err("moisturePercent")}>
          <NumberField id="moisturePercent" name="moisturePercent" unit="%" />
        </Field>
      </div>
      <Field id="notes" label="Notes" error={err("notes")}>
        <Input id="notes" name="notes" />
      </Field>
      <Button type="submit" disabled={pending}>
        {pending ? "Saving…" : "Save lot"}
      </Button>
    </form>
  );
}
