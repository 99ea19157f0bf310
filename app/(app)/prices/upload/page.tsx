import type { Metadata } from "next";
import { NotAllowed } from "@/components/forms/not-allowed";
import { PriceListUpload } from "@/components/prices/price-list-upload";
import { Card } from "@/components/ui/card";
import { requireViewer } from "@/lib/auth/current";
import { can } from "@/lib/auth/permissions";
import { listSuppliers } from "@/lib/data/suppliers";
import { isoDay } from "@/lib/pricing/convert";

export const metadata: Metadata = { title: "Upload a price list" };

export default async function PriceListUploadPage({ searchParams }: { searchParams: Promise<{ supplierId?: string }> }) {
  const viewer = await requireViewer();
  const { supplierId } = await searchParams;
  const allowed = can(viewer.role, "suppliers.edit");
  const suppliers = allowed ? await listSuppliers({ workspaceId: viewer.workspace.id }) : [];
  return (
    <div className="space-y-6">
      <div>
        <h1 className="text-3xl font-bold">Upload a price list</h1>
        <p className="mt-2 max-w-2xl text-cocoa-700">
          A supplier&apos;s prices as a CSV file: one row per ingredient, with at least the ingredient&apos;s name as in your library and a
          price. Nothing is saved until you import, and the same quote is never recorded twice.
        </p>
      </div>
      {allowed ? (
        <Card>
          <PriceListUpload
            suppliers={suppliers.map((s) => ({ value: s.id, label: `${s.name} (${s.currency})` }))}
            initialSupplierId={suppliers.some((s) => s.id === supplierId) ? supplierId : undefined}
            today={isoDay(new Date())}
          />
        </Card>
      ) : (
        <NotAllowed what="upload price lists" who="Owners and buyers" />
      )}
    </div>
  );
}
