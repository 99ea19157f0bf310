import Link from "next/link";
import { Button } from "@/components/ui/button";

/** The sub-pages of Batches, shown at the top of each. */
export function BatchLinks({ canPlan, canBuy, canManageMachines }: { canPlan: boolean; canBuy: boolean; canManageMachines: boolean }) {
  return (
    <div className="flex flex-wrap gap-2">
      <Button asChild variant="secondary">
        <Link href="/batches/requirements">Material requirements</Link>
      </Button>
      {canBuy ? (
        <Button asChild variant="secondary">
          <Link href="/batches/purchase-orders">Purchase orders</Link>
        </Button>
      ) : null}
      <Button asChild variant="secondary">
        <Link href="/settings/machines">{canManageMachines ? "Machines and scales" : "Machines"}</Link>
      </Button>
      {canPlan ? (
        <Button asChild>
          <Link href="/batches/new">Plan a batch</Link>
        </Button>
      ) : null}
    </div>
  );
}
