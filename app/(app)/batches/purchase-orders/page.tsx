import type { Metadata } from "next";
import Link from "next/link";
import { OrderStatusBadge } from "@/components/batches/status-badge";
import { Button } from "@/components/ui/button";
import { Table, Td, Th } from "@/components/ui/table";
import { requireViewer } from "@/lib/auth/current";
import { listPurchaseOrders } from "@/lib/data/purchase-orders";
import { formatDate } from "@/lib/format";

export const metadata: Metadata = { title: "Purchase orders" };

export default async function PurchaseOrdersPage() {
  const viewer = await requireViewer();
  const orders = await listPurchaseOrders({ workspaceId: viewer.workspace.id });
  return (
    <div className="space-y-6">
      <div className="flex flex-wrap items-end justify-between gap-4">
        <div>
          <p className="text-sm font-semibold uppercase tracking-widest text-pod-dark">
            <Link href="/batches">Batches</Link>
          </p>
          <h1 className="mt-1 text-3xl font-bold">Purchase orders</h1>
          <p className="mt-2 max-w-2xl text-cocoa-700">Drafted from material requirements, sent by e-mail with the order attached, received into stock.</p>
        </div>
        <Button asChild variant="secondary">
          <Link href="/batches/requirements">Material requirements</Link>
        </Button>
      </div>
      {orders.length === 0 ? (
        <p className="text-cocoa-500">No purchase order yet.</p>
      ) : (
        <Table>
          <thead>
            <tr>
              <Th>Order</Th>
              <Th>Supplier</Th>
              <Th>Drafted</Th>
              <Th>Sent</Th>
              <Th>Received</Th>
              <Th>Status</Th>
            </tr>
          </thead>
          <tbody>
            {orders.map((o) => (
              <tr key={o.id} data-testid={`order-${o.number}`}>
                <Td>
                  <Link href={`/batches/purchase-orders/${o.id}`} className="font-semibold text-pod-dark underline-offset-2 hover:underline">
                    {o.number}
                  </Link>
                </Td>
                <Td>{o.supplierName}</Td>
                <Td>{formatDate(o.createdAt)}</Td>
                <Td>{formatDate(o.sentAt)}</Td>
                <Td>{formatDate(o.receivedOn)}</Td>
                <Td>
                  <OrderStatusBadge status={o.status} />
                </Td>
              </tr>
            ))}
          </tbody>
        </Table>
      )}
    </div>
  );
}
