import Decimal from "decimal.js";
import Link from "next/link";
import { OrderStatusBadge } from "@/components/batches/status-badge";
import { Badge } from "@/components/ui/badge";
import { Card, CardHeader } from "@/components/ui/card";
import type { Few, OpenOrder, PlannedBatch } from "@/lib/data/overview";
import { formatDate, formatKg } from "@/lib/format";
import { FewFooter } from "./few-footer";

/** Planned batches (overdue ones first) and purchase orders still to send or receive. */
export function ProductionCard({ batches, orders }: { batches: Few<PlannedBatch>; orders: Few<OpenOrder> }) {
  return (
    <Card data-testid="overview-production">
      <CardHeader title="Production" description="Batches planned and not yet recorded as made, and purchase orders still open." />
      <h3 className="text-sm font-semibold text-cocoa-700">Planned batches</h3>
      {batches.rows.length === 0 ? (
        <p className="mt-1 text-sm text-cocoa-500">Nothing planned.</p>
      ) : (
        <ul className="mt-1 divide-y divide-sand-light text-sm">
          {batches.rows.map((b) => (
            <li key={b.id} className="flex flex-wrap items-baseline justify-between gap-x-3 gap-y-1 py-2" data-testid={`planned-${b.code}`}>
              <span>
                <Link href={`/batches/${b.id}`} className="font-semibold text-pod-dark hover:underline">
                  {b.code}
                </Link>{" "}
                {b.recipeName} <span className="text-cocoa-500">v{b.versionNo}</span>
              </span>
              <span className="figures flex items-center gap-2 whitespace-nowrap">
                {formatKg(new Decimal(b.totalMassGrams).div(1000).toFixed(), 1)} · {formatDate(b.plannedFor)}
                {b.overdue ? <Badge tone="short">overdue</Badge> : null}
              </span>
            </li>
          ))}
        </ul>
      )}
      <FewFooter shown={batches.rows.length} total={batches.total} href="/batches" where="Batches" />
      <h3 className="mt-5 text-sm font-semibold text-cocoa-700">Open purchase orders</h3>
      {orders.rows.length === 0 ? (
        <p className="mt-1 text-sm text-cocoa-500">None open.</p>
      ) : (
        <ul className="mt-1 divide-y divide-sand-light text-sm">
          {orders.rows.map((o) => (
            <li key={o.id} className="flex flex-wrap items-baseline justify-between gap-x-3 gap-y-1 py-2" data-testid={`open-order-${o.number}`}>
              <span>
                <Link href={`/batches/purchase-orders/${o.id}`} className="font-semibold text-pod-dark hover:underline">
                  {o.number}
                </Link>{" "}
                {o.supplierName}
              </span>
              <span className="flex items-center gap-2 whitespace-nowrap">
                <span className="text-cocoa-500">{o.status === "sent" ? `sent ${formatDate(o.sentAt)}` : `drafted ${formatDate(o.createdAt)}`}</span>
                <OrderStatusBadge status={o.status} />
              </span>
            </li>
          ))}
        </ul>
      )}
      <FewFooter shown={orders.rows.length} total={orders.total} href="/batches/purchase-orders" where="Purchase orders" />
    </Card>
  );
}
