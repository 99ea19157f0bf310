import type { Metadata } from "next";
import Link from "next/link";
import { CostsNotAllowed } from "@/components/costing/costs-not-allowed";
import { PriceListHistory } from "@/components/prices/price-list-history";
import { QuotesTable } from "@/components/prices/quotes-table";
import { QuotesToCheck } from "@/components/prices/quotes-to-check";
import { Button } from "@/components/ui/button";
import { Card, CardHeader } from "@/components/ui/card";
import { canSeeCosts } from "@/lib/auth/costs";
import { requireViewer } from "@/lib/auth/current";
import { can } from "@/lib/auth/permissions";
import { listQuotesToCheck } from "@/lib/data/overview";
import { isoDay } from "@/lib/pricing/convert";

export const metadata: Metadata = { title: "Prices" };

export default async function PricesPage() {
  const viewer = await requireViewer();
  if (!(await canSeeCosts(viewer))) return <CostsNotAllowed />;
  const buyer = can(viewer.role, "suppliers.edit");
  const toCheck = buyer ? await listQuotesToCheck({ workspaceId: viewer.workspace.id, on: isoDay(new Date()), limit: 100 }) : null;
  return (
    <div className="space-y-6">
      <div className="flex flex-wrap items-end justify-between gap-4">
        <div>
          <h1 className="text-3xl font-bold">Prices</h1>
          <p className="mt-2 max-w-2xl text-cocoa-700">
            Every quote your suppliers have given, kept as history. Per-kg figures are in your base currency at the exchange rate of
            each quote&apos;s first day.
          </p>
        </div>
        <div className="flex flex-wrap gap-2">
          <Button asChild variant="secondary">
            <Link href="/settings/currencies">Currencies</Link>
          </Button>
          <Button asChild variant="secondary">
            <a href="/api/quotes/export" download>
              Export CSV
            </a>
          </Button>
          {buyer ? (
            <Button asChild>
              <Link href="/prices/upload">Upload a price list</Link>
            </Button>
          ) : null}
        </div>
      </div>
      {toCheck ? <QuotesToCheck quotes={toCheck} /> : null}
      <QuotesTable />
      <Card>
        <CardHeader title="Recent price-list uploads" />
        <PriceListHistory showSupplier />
      </Card>
    </div>
  );
}
