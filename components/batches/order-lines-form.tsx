"use client";

import { useRouter } from "next/navigation";
import { useState, useTransition } from "react";
import { updatePurchaseOrderAction } from "@/app/(app)/batches/purchase-orders/actions";
import { FormAlert } from "@/components/forms/form-alert";
import { Button } from "@/components/ui/button";
import { Field } from "@/components/ui/field";
import { Input } from "@/components/ui/input";
import { NumberField } from "@/components/ui/number-field";
import type { OrderLine } from "@/lib/data/purchase-orders";

const UNIT = { per_kg: "per kg", per_pack: "per pack", per_tonne: "per t" } as const;

/** A drafted order's quantities and prices; 0 kg leaves a line out of the order. */
export function OrderLinesForm({ orderId, lines, notes }: { orderId: string; lines: OrderLine[]; notes: string | null }) {
  const router = useRouter();
  const [values, setValues] = useState(() => lines.map((l) => ({ lineId: l.id, quantityKg: l.quantityKg, price: l.price ?? "" })));
  const [note, setNote] = useState(notes ?? "");
  const [result, setResult] = useState<{ ok: boolean; message?: string; fieldErrors?: Record<string, string[] | undefined> } | null>(null);
  const [pending, start] = useTransition();
  const set = (i: number, patch: Partial<(typeof values)[number]>) => setValues((vs) => vs.map((v, j) => (j === i ? { ...v, ...patch } : v)));
  const err = (i: number, f: string) => (result?.ok ? undefined : result?.fieldErrors?.[`lines.${i}.${f}`]?.[0]);
  return (
    <form
      className="space-y-4"
      noValidate
      aria-label="Order lines"
      onSubmit={(e) => {
        e.preventDefault();
        start(async () => {
          const r = await updatePurchaseOrderAction({ orderId, notes: note, lines: values });
          setResult(r.ok ? { ok: true, message: "Saved." } : r);
          if (r.ok) router.refresh();
        });
      }}
    >
      <FormAlert result={result} />
      <table className="w-full text-sm">
        <thead>
          <tr className="text-left text-xs uppercase tracking-wide text-cocoa-500">
            <th className="py-2 font-semibold">Ingredient</th>
            <th className="py-2 text-right font-semibold">Short</th>
            <th className="w-40 py-2 pl-3 font-semibold">Quantity</th>
            <th className="w-44 py-2 pl-3 font-semibold">Price</th>
          </tr>
        </thead>
        <tbody>
          {lines.map((l, i) => (
            <tr key={l.id} className="border-t border-sand-light align-top">
              <td className="py-2">
                {l.ingredientName}
                <span className="block text-xs text-cocoa-500">
                  {l.packKg ? `packs of ${l.packKg} kg` : "by the kg"}
                  {l.minimumOrderKg ? `, minimum ${l.minimumOrderKg} kg` : ""}
                </span>
              </td>
              <td className="figures py-2 text-right">{l.neededKg} kg</td>
              <td className="py-2 pl-3">
                <NumberField aria-label={`Quantity ${l.ingredientName}`} unit="kg" value={values[i]!.quantityKg} onChange={(e) => set(i, { quantityKg: e.target.value })} />
                {err(i, "quantityKg") ? <p role="alert" className="mt-1 text-sm text-brick">{err(i, "quantityKg")}</p> : null}
              </td>
              <td className="py-2 pl-3">
                <NumberField aria-label={`Price ${l.ingredientName}`} unit={l.currency && l.priceUnit ? `${l.currency} ${UNIT[l.priceUnit]}` : ""} className="pr-28" value={values[i]!.price} onChange={(e) => set(i, { price: e.target.value })} />
                {err(i, "price") ? <p role="alert" className="mt-1 text-sm text-brick">{err(i, "price")}</p> : null}
              </td>
            </tr>
          ))}
        </tbody>
      </table>
      <Field id="orderNotes" label="Notes for the supplier">
        <Input id="orderNotes" value={note} onChange={(e) => setNote(e.target.value)} />
      </Field>
      <Button type="submit" variant="secondary" disabled={pending}>
        {pending ? "Saving…" : "Save changes"}
      </Button>
    </form>
  );
}
