import { Badge } from "@/components/ui/badge";
import type { BatchStatus } from "@/db/schema/batches";
import type { PurchaseOrderStatus } from "@/db/schema/purchases";

const batchTone = { planned: "accent", completed: "meets", cancelled: "neutral" } as const;
const orderTone = { drafted: "neutral", sent: "accent", received: "meets", cancelled: "neutral" } as const;

export function BatchStatusBadge({ status }: { status: BatchStatus }) {
  return <Badge tone={batchTone[status]}>{status}</Badge>;
}

export function OrderStatusBadge({ status }: { status: PurchaseOrderStatus }) {
  return <Badge tone={orderTone[status]}>{status}</Badge>;
}
