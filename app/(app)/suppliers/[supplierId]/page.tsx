import type { Metadata } from "next";
import Link from "next/link";
import { FilePanel } from "@/components/files/file-panel";
import { PriceListHistory } from "@/components/prices/price-list-history";
import { QuoteForm } from "@/components/prices/quote-form";
import { QuotesTable } from "@/components/prices/quotes-table";
import { SupplierAdmin } from "@/components/suppliers/supplier-admin";
import { SupplierForm } from "@/components/suppliers/supplier-form";
import { Badge } from "@/components/ui/badge";
import { Button } from "@/components/ui/button";
import { Card, CardHeader } from "@/components/ui/card";
import { canSeeCosts } from "@/lib/auth/costs";
import { requireViewer } from "@/lib/auth/current";
import { can } from "@/lib/auth/permissions";
import { listIngredients } from "@/lib/data/ingredients";
import { getSupplierById } from "@/lib/data/suppliers";
import { orNotFound, pageId } from "@/lib/pages/or-not-found";
import { isoDay } from "@/lib/pricing/convert";

export const metadata: Metadata = { title: "Supplier" };

export default async function SupplierPage({ params }: { params: Promise<{ supplierId: string }> }) {
  const viewer = await requireViewer();
  const supplierId = pageId((await params).supplierId);
  const workspaceId = viewer.workspace.id;
  const supplier = await orNotFound(getSupplierById({ workspaceId, supplierId }));
  const buyer = can(viewer.role, "suppliers.edit");
  const showPrices = await canSeeCosts(viewer);
  const ingredients = buyer ? await listIngredients({ workspaceId }) : [];
  return (
    <div className="space-y-8">
      <div className="flex flex-wrap items-end justify-between gap-4">
        <div>
          <p className="text-sm text-cocoa-500">
            <Link href="/suppliers" className="hover:underline">Suppliers</Link>
          </p>
          <h1 className="text-3xl font-bold">
            {supplier.name}
            {supplier.archived ? <Badge className="ml-3 align-middle">archived</Badge> : null}
          </h1>
          <p className="mt-1 text-cocoa-700">
            Prices in {supplier.currency}
            {supplier.leadTimeDays !== null ? ` · ${supplier.leadTimeDays} days lead time` : ""}
            {supplier.contactName ? ` · ${supplier.contactName}` : ""}
            {supplier.email ? ` · ${supplier.email}` : ""}
          </p>
        </div>
        {buyer ? (
          <div className="flex flex-wrap gap-2">
            {!supplier.archived ? (
              <Button asChild>
                <Link href={`/prices/upload?supplierId=${supplier.id}`}>Upload a price list</Link>
              </Button>
            ) : null}
            <SupplierAdmin id={supplier.id} name={supplier.name} archived={supplier.archived} />
          </div>
        ) : null}
      </div>

      {showPrices ? (
        <Card>
          <CardHeader title="Quotes" description="Every price this supplier has given, newest first. The current one for each ingredient is marked." />
          <QuotesTable filter={{ supplierId: supplier.id }} hide={["supplier"]} />
          {buyer && !supplier.archived ? (
            <div className="mt-8 border-t border-sand-light pt-6">
              <h3 className="mb-4 font-bold">Record a quote</h3>
              <QuoteForm
                supplierId={supplier.id}
                ingredients={ingredients.map((i) => ({ value: i.id, label: i.name }))}
                defaultCurrency={supplier.currency}
                today={isoDay(new Date())}
              />
            </div>
          ) : null}
        </Card>
      ) : null}

      <Card>
        <CardHeader title="Price-list uploads" />
        <PriceListHistory supplierId={supplier.id} />
      </Card>

      <Card>
        <CardHeader title="Certificates and documents" description="Only members of this workspace can download them." />
        <FilePanel owner={{ kind: "suppliers", id: supplier.id }} canEdit={buyer} />
      </Card>

      {buyer ? (
        <Card>
          <CardHeader title="Details" />
          <SupplierForm supplier={supplier} />
        </Card>
      ) : null}
    </div>
  );
}
