"use client";

import { useRouter } from "next/navigation";
import { useTransition } from "react";
import { deleteExchangeRateAction, saveExchangeRateAction, setBaseCurrencyAction } from "@/app/(app)/settings/currencies/actions";
import { FormAlert } from "@/components/forms/form-alert";
import { useActionForm } from "@/components/forms/use-action-form";
import { Button } from "@/components/ui/button";
import { Field } from "@/components/ui/field";
import { Input } from "@/components/ui/input";
import { NumberField } from "@/components/ui/number-field";
import { Table, Td, Th } from "@/components/ui/table";
import { useToast } from "@/components/ui/toast";
import type { ExchangeRateRecord } from "@/lib/data/exchange-rates";
import { formatDate } from "@/lib/format";

/** The base currency form (refused while rates exist, with the reason). */
export function BaseCurrencyForm({ base }: { base: string }) {
  const router = useRouter();
  const form = useActionForm(setBaseCurrencyAction, () => {
    router.refresh();
    return "Base currency saved.";
  });
  return (
    <form onSubmit={form.onSubmit} className="flex flex-wrap items-end gap-3" noValidate>
      <Field id="base" label="Base currency" hint="Every cost is shown in it." error={form.error("baseCurrency")}>
        <Input id="base" name="baseCurrency" defaultValue={base} maxLength={3} className="w-28" />
      </Field>
      <Button type="submit" variant="secondary" disabled={form.pending}>Change</Button>
      <div className="basis-full">
        <FormAlert result={form.result} />
      </div>
    </form>
  );
}

/** Dated exchange rates: add (a same-day entry corrects that day) and delete. */
export function ExchangeRates({ base, rates, canEdit, today }: { base: string; rates: ExchangeRateRecord[]; canEdit: boolean; today: string }) {
  const router = useRouter();
  const toast = useToast();
  const [pending, start] = useTransition();
  const form = useActionForm(saveExchangeRateAction, (data, el) => {
    el.reset();
    router.refresh();
    return data.replaced ? "That day's rate was corrected." : "Rate added.";
  });
  const err = form.error;
  return (
    <div className="space-y-6">
      {rates.length === 0 ? (
        <p className="text-sm text-cocoa-500">No exchange rate yet: only quotes in {base} can be costed.</p>
      ) : (
        <Table>
          <thead>
            <tr>
              <Th>Currency</Th>
              <Th numeric>1 unit = {base}</Th>
              <Th>From</Th>
              {canEdit ? <Th /> : null}
            </tr>
          </thead>
          <tbody>
            {rates.map((r) => (
              <tr key={r.id} data-testid={`rate-${r.currency}-${r.validOn}`}>
                <Td className="font-semibold">{r.currency}</Td>
                <Td numeric>{r.rateToBase}</Td>
                <Td>{formatDate(r.validOn)}</Td>
                {canEdit ? (
                  <Td className="text-right">
                    <Button
                      variant="quiet"
                      size="sm"
                      disabled={pending}
                      aria-label={`Delete the ${r.currency} rate of ${r.validOn}`}
                      onClick={() =>
                        start(async () => {
                          const res = await deleteExchangeRateAction({ rateId: r.id });
                          if (!res.ok) toast({ title: "Not deleted", description: res.message, tone: "error" });
                          router.refresh();
                        })
                      }
                    >
                      Delete
                    </Button>
                  </Td>
                ) : null}
              </tr>
            ))}
          </tbody>
        </Table>
      )}
      {canEdit ? (
        <form onSubmit={form.onSubmit} className="grid gap-4 sm:grid-cols-[8rem_12rem_12rem_auto] sm:items-end" noValidate>
          <div className="sm:col-span-4">
            <FormAlert result={form.result} />
          </div>
          <Field id="rate-currency" label="Currency" error={err("currency")}>
            <Input id="rate-currency" name="currency" maxLength={3} placeholder="USD" aria-invalid={!!err("currency")} />
          </Field>
          <Field id="rate-value" label={`Worth in ${base}`} error={err("rateToBase")}>
            <NumberField id="rate-value" name="rateToBase" unit={base} aria-invalid={!!err("rateToBase")} />
          </Field>
          <Field id="rate-from" label="From" error={err("validOn")}>
            <Input id="rate-from" name="validOn" type="date" defaultValue={today} aria-invalid={!!err("validOn")} />
          </Field>
          <Button type="submit" disabled={form.pending}>Add rate</Button>
        </form>
      ) : null}
    </div>
  );
}
