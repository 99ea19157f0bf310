"use client";

import { useRouter } from "next/navigation";
import { createSupplierAction, updateSupplierAction } from "@/app/(app)/suppliers/actions";
import { FormAlert } from "@/components/forms/form-alert";
import { useActionForm } from "@/components/forms/use-action-form";
import { Button } from "@/components/ui/button";
import { Field } from "@/components/ui/field";
import { Input } from "@/components/ui/input";
import { NumberField } from "@/components/ui/number-field";
import type { SupplierSummary } from "@/lib/data/suppliers";

/** Create or edit a supplier; refused fields keep what was typed, with the reason beside each. */
export function SupplierForm({ supplier }: { supplier?: SupplierSummary }) {
  const router = useRouter();
  const form = useActionForm<{ id: string } | void>(supplier ? updateSupplierAction : createSupplierAction, (data) => {
    router.refresh();
    if (supplier) return "Saved.";
    router.push(`/suppliers/${(data as { id: string }).id}`);
  });
  const err = form.error;
  return (
    <form onSubmit={form.onSubmit} className="grid gap-4 md:grid-cols-2" noValidate>
      <div className="md:col-span-2">
        <FormAlert result={form.result} />
      </div>
      {supplier ? <input type="hidden" name="supplierId" value={supplier.id} /> : null}
      <Field id="s-name" label="Name" error={err("name")}>
        <Input id="s-name" name="name" defaultValue={supplier?.name} aria-invalid={!!err("name")} />
      </Field>
      <Field id="s-contact" label="Contact person" error={err("contactName")}>
        <Input id="s-contact" name="contactName" defaultValue={supplier?.contactName ?? ""} />
      </Field>
      <Field id="s-email" label="E-mail" error={err("email")}>
        <Input id="s-email" name="email" type="email" defaultValue={supplier?.email ?? ""} aria-invalid={!!err("email")} />
      </Field>
      <div className="grid grid-cols-2 gap-4">
        <Field id="s-currency" label="Currency" hint="ISO code of their prices, e.g. GBP." error={err("currency")}>
          <Input id="s-currency" name="currency" maxLength={3} defaultValue={supplier?.currency ?? "EUR"} aria-invalid={!!err("currency")} />
        </Field>
        <Field id="s-lead" label="Lead time" error={err("leadTimeDays")}>
          <NumberField id="s-lead" name="leadTimeDays" unit="days" inputMode="numeric" defaultValue={supplier?.leadTimeDays ?? ""} aria-invalid={!!err("leadTimeDays")} />
        </Field>
      </div>
      <div className="md:col-span-2">
        <Field id="s-notes" label="Notes" error={err("notes")}>
          <textarea
            id="s-notes"
            name="notes"
            defaultValue={supplier?.notes ?? ""}
            className="min-h-20 w-full rounded-lg border border-sand bg-white px-3 py-2 focus:border-pod focus:outline-none focus:ring-2 focus:ring-pod/30"
          />
        </Field>
      </div>
      <div>
        <Button type="submit" disabled={form.pending}>
          {form.pending ? "Saving…" : supplier ? "Save supplier" : "Add supplier"}
        </Button>
      </div>
    </form>
  );
}
