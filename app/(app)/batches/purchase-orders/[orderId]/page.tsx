import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { OrderActions } from "@/components/batches/order-actions";
import { OrderLinesForm } from "@/components/batches/order-lines-form";
import { OrderStatusBadge } from "@/components/batches/status-badge";
import { Button } from "@/components/ui/button";
import { Card, CardHeader } from "@/components/ui/card";
import { Table, Td, Th } from "@/components/ui/table";
import { requireViewer } from "@/lib/auth/current";
import { can } from "@/lib/auth/permissions";
import { listBatches } from "@/lib/data/batches";
import { getPurchaseOrderForViewer } from "@/lib/cost-visibility/purchasing";
import type { OrderDetail } from "@/lib/data/purchase-orders";
import { AppError } from "@/lib/errors";
import { formatDate, formatKg, formatMoney } from "@/lib/format";
import { idSchema } from "@/lib/validation/auth";

export const metadata: Metadata = { title: "Purchase order" };

const UNIT = { per_kg: "per kg", per_pack: "per pack", per_tonne: "per t" } as const;

export default async function PurchaseOrderPage({ params }: { params: Promise<{ orderId: string }> }) {
  const viewer = await requireViewer();
  const { orderId } = await params;
  if (!idSchema.safeParse(orderId).success) notFound();
  let order: OrderDetail;
  let costsShown: boolean;
  try {
    ({ order, costsShown } = await getPurchaseOrderForViewer({ viewer, orderId }));
  } catch (err) {
    if (err instanceof AppError && err.code === "not_found") notFound();
    throw err;
  }
  const canBuy = can(viewer.role, "purchases.manage");
  const batches = await listBatches({ workspaceId: viewer.workspace.id, ids: order.batchIds });
  const facts: [string, string][] = [
    ["Supplier", order.supplierName],
    ["E-mail", order.supplierEmail ?? "none on file"],
    ["Drafted", `${formatDate(order.createdAt)}${order.createdByName ? ` by ${order.createdByName}` : ""}`],
    ["Sent", order.sentAt ? `${formatDate(order.sentAt)} to ${order.sentTo}` : "—"],
    ["Received", formatDate(order.receivedOn)],
  ];
  if (costsShown) facts.push(["Value", Object.entries(order.totals).map(([c, v]) => formatMoney(v, c)).join(" + ") || "—"]);
  return (
    <div className="space-y-8">
      <div className="flex flex-wrap items-start justify-between gap-4">
        <div>
          <p className="text-sm font-semibold uppercase tracking-widest text-pod-dark">
            <Link href="/batches/purchase-orders">Purchase order</Link>
          </p>
          <h1 className="mt-1 flex items-center gap-3 text-3xl font-bold">
            <span data-testid="order-number">{order.number}</span> <OrderStatusBadge status={order.status} />
          </h1>
        </div>
        {canBuy ? (
          <Button asChild variant="secondary">
            <a href={`/api/purchase-orders/${order.id}/csv`}>Download CSV</a>
          </Button>
        ) : null}
      </div>
      <dl className="grid gap-x-8 gap-y-2 text-sm sm:grid-cols-3">
        {facts.map(([k, v]) => (
          <div key={k}>
            <dt className="text-cocoa-500">{k}</dt>
            <dd className="figures font-semibold">{v}</dd>
          </div>
        ))}
      </dl>
      {batches.length ? (
        <p className="text-sm text-cocoa-700">
          For batches{" "}
          {batches.map((b, i) => (
            <span key={b.id}>
              {i > 0 ? ", " : ""}
              <Link href={`/batches/${b.id}`} className="font-semibold text-pod-dark underline-offset-2 hover:underline">
                {b.code}
              </Link>
            </span>
          ))}
          .
        </p>
      ) : null}
      <Card>
        <CardHeader
          title="Lines"
          description={`Rounded up to the supplier's packs and minimum order${costsShown ? "; prices from the current quote when drafted" : ""}.`}
        />
        {canBuy && order.status === "drafted" ? (
          <OrderLinesForm orderId={order.id} lines={order.lines} notes={order.notes} />
        ) : (
          <Table>
            <thead>
              <tr>
                <Th>Ingredient</Th>
                <Th numeric>Quantity</Th>
                {costsShown ? <Th numeric>Price</Th> : null}
                {costsShown ? <Th numeric>Amount</Th> : null}
              </tr>
            </thead>
            <tbody>
              {order.lines.map((l) => (
                <tr key={l.id}>
                  <Td>{l.ingredientName}</Td>
                  <Td numeric>
                    {formatKg(l.quantityKg, 3)}
                    {l.packs ? <span className="block text-xs text-cocoa-500">{l.packs} × {formatKg(l.packKg, 0)}</span> : null}
                  </Td>
                  {costsShown ? <Td numeric>{l.price && l.currency && l.priceUnit ? `${formatMoney(l.price, l.currency)} ${UNIT[l.priceUnit]}` : "—"}</Td> : null}
                  {costsShown ? <Td numeric>{l.amount && l.currency ? formatMoney(l.amount, l.currency) : "—"}</Td> : null}
                </tr>
              ))}
            </tbody>
          </Table>
        )}
        {order.notes && order.status !== "drafted" ? <p className="mt-3 text-sm text-cocoa-700">Notes: {order.notes}</p> : null}
      </Card>
      {canBuy ? <OrderActions orderId={order.id} status={order.status} supplierEmail={order.supplierEmail} today={new Date().toISOString().slice(0, 10)} /> : null}
    </div>
  );
}
