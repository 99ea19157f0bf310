import type { Metadata } from "next";
import { notFound } from "next/navigation";
import { NewLotForm } from "@/components/lots/new-lot-form";
import { Card } from "@/components/ui/card";
import { requireViewer } from "@/lib/auth/current";
import { can } from "@/lib/auth/permissions";
import { listSuppliers } from "@/lib/data/suppliers";
import { getWorkspaceBaseCurrency } from "@/lib/data/workspaces";

export const metadata: Metadata = { title: "Record a lot" };

export default async function NewLotPage() {
  const viewer = await requireViewer();
  if (!can(viewer.role, "lots.edit")) notFound();
  const [suppliers, base] = await Promise.all([
    listSuppliers({ workspaceId: viewer.workspace.id }),
    getWorkspaceBaseCurrency({ workspaceId: viewer.workspace.id }),
  ]);
  return (
    <div className="max-w-3xl space-y-6">
      <div>
        <h1 className="text-3xl font-bold">Record a lot</h1>
        <p className="mt-2 text-cocoa-700">The beans as they arrived: where from, how much, and what they cost to get here.</p>
      </div>
      <Card>
        <NewLotForm suppliers={suppliers.map((s) => ({ value: s.id, label: s.name, currency: s.currency }))} baseCurrency={base} />
      </Card>
    </div>
  );
}
