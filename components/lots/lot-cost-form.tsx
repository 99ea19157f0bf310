"use client";

import { useActionState } from "react";
import { addLotCostAction } from "@/app/(app)/lots/actions";
import { FormAlert, fieldError } from "@/components/forms/form-alert";
import { Button } from "@/components/ui/button";
import { Field } from "@/components/ui/field";
import { Input } from "@/components/ui/input";
import { NumberField } from "@/components/ui/number-field";

export function LotCostForm({ lotId, currency }: { lotId: string; currency: string }) {
  const [result, action, pending] = useActionState(addLotCostAction, null);
  const err = (f: string) => fieldError(result, f);
  return (
    <form action={action} className="space-y-4" noValidate aria-label="Add a cost">
      <FormAlert result={result?.ok ? { ok: true, message: "Cost added." } : result} />
      <input type="hidden" name="lotId" value={lotId} />
      <Field id="costLabel" label="What for" error={err("label")}>
        <Input id="costLabel" name="label" placeholder="Insurance" />
      </Field>
      <div className="grid grid-cols-2 gap-4">
        <Field id="costAmount" label="Amount" error={err("amount")}>
          <NumberField id="costAmount" name="amount" unit="" />
        </Field>
        <Field id="costCurrency" label="Currency" error={err("currency")}>
          <Input id="costCurrency" name="currency" defaultValue={currency} maxLength={3} />
        </Field>
      </div>
      <Button type="submit" variant="secondary" disabled={pending}>
        Add cost
      </Button>
    </form>
  );
}
