"use client";

import { useRouter } from "next/navigation";
import { useState, useTransition } from "react";
import { cancelPurchaseOrderAction, receivePurchaseOrderAction, sendPurchaseOrderAction } from "@/app/(app)/batches/purchase-orders/actions";
import { FormAlert } from "@/components/forms/form-alert";
import { Button } from "@/components/ui/button";
import { Input } from "@/components/ui/input";
import type { PurchaseOrderStatus } from "@/db/schema/purchases";

/** Send (drafted), receive (sent), cancel (drafted or sent). */
export function OrderActions({ orderId, status, supplierEmail, today }: { orderId: string; status: PurchaseOrderStatus; supplierEmail: string | null; today: string }) {
  const router = useRouter();
  const [result, setResult] = useState<{ ok: boolean; message?: string } | null>(null);
  const [receivedOn, setReceivedOn] = useState(today);
  const [pending, start] = useTransition();
  const run = (work: () => Promise<{ ok: boolean; message?: string }>, done: string) =>
    start(async () => {
      const r = await work();
      setResult(r.ok ? { ok: true, message: done } : r);
      if (r.ok) router.refresh();
    });
  if (status === "received" || status === "cancelled") return null;
  return (
    <div className="space-y-3">
      <FormAlert result={result} />
      <div className="flex flex-wrap items-center gap-2">
        {status === "drafted" ? (
          <Button disabled={pending} onClick={() => run(() => sendPurchaseOrderAction({ orderId }), `Sent to ${supplierEmail ?? "the supplier"}.`)}>
            {pending ? "Working…" : "Send to supplier"}
          </Button>
        ) : (
          <>
            <Input aria-label="Received on" type="date" className="w-44" value={receivedOn} onChange={(e) => setReceivedOn(e.target.value)} />
            <Button disabled={pending} onClick={() => run(() => receivePurchaseOrderAction({ orderId, receivedOn }), "Received: stock and prices updated.")}>
              Mark received
            </Button>
          </>
        )}
        <Button
          variant="secondary"
          disabled={pending}
          onClick={() => {
            if (window.confirm(status === "sent" ? "Cancel this order? Tell the supplier too." : "Cancel this draft?")) run(() => cancelPurchaseOrderAction({ orderId }), "Cancelled.");
          }}
        >
          Cancel order
        </Button>
      </div>
    </div>
  );
}
