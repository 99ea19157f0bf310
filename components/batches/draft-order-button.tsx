"use client";

import { useRouter } from "next/navigation";
import { useState, useTransition } from "react";
import { draftPurchaseOrderAction } from "@/app/(app)/batches/purchase-orders/actions";
import { Button } from "@/components/ui/button";

/** Drafts an order to one supplier for the shown batches' shortfall, then opens it. */
export function DraftOrderButton({ supplierId, supplierName, batchIds }: { supplierId: string; supplierName: string; batchIds: string[] }) {
  const router = useRouter();
  const [error, setError] = useState<string | null>(null);
  const [pending, start] = useTransition();
  return (
    <div className="flex items-center gap-3">
      {error ? (
        <span role="alert" className="text-sm text-brick">
          {error}
        </span>
      ) : null}
      <Button
        disabled={pending}
        aria-label={`Draft a purchase order to ${supplierName}`}
        onClick={() =>
          start(async () => {
            setError(null);
            const r = await draftPurchaseOrderAction({ supplierId, batchIds });
            if (r.ok) router.push(`/batches/purchase-orders/${r.data.id}`);
            else setError(r.message);
          })
        }
      >
        {pending ? "Drafting…" : "Draft purchase order"}
      </Button>
    </div>
  );
}
