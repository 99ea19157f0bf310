import type { Metadata } from "next";
import Link from "next/link";
import { RequirementsGroup } from "@/components/batches/requirements-group";
import { Button } from "@/components/ui/button";
import { Card } from "@/components/ui/card";
import { requireViewer } from "@/lib/auth/current";
import { formatGrams } from "@/lib/batches/format-mass";
import { can } from "@/lib/auth/permissions";
import { materialRequirementsForViewer } from "@/lib/cost-visibility/purchasing";
import { listBatches } from "@/lib/data/batches";
import { formatDate } from "@/lib/format";
import { idSchema } from "@/lib/validation/auth";

export const metadata: Metadata = { title: "Material requirements" };

/** What planned batches need, against stock and open orders, by supplier. ?batch=id (repeatable) narrows it. */
export default async function RequirementsPage({ searchParams }: { searchParams: Promise<{ batch?: string | string[] }> }) {
  const viewer = await requireViewer();
  const workspaceId = viewer.workspace.id;
  const { batch } = await searchParams;
  const asked = (Array.isArray(batch) ? batch : batch ? [batch] : []).filter((id) => idSchema.safeParse(id).success);
  const planned = await listBatches({ workspaceId, status: "planned" });
  const chosen = asked.length ? planned.filter((b) => asked.includes(b.id)).map((b) => b.id) : planned.map((b) => b.id);
  const { groups, costsShown } = await materialRequirementsForViewer({ viewer, batchIds: chosen });
  return (
    <div className="space-y-6">
      <div>
        <p className="text-sm font-semibold uppercase tracking-widest text-pod-dark">
          <Link href="/batches">Batches</Link>
        </p>
        <h1 className="mt-1 text-3xl font-bold">Material requirements</h1>
        <p className="mt-2 max-w-2xl text-cocoa-700">
          Everything the chosen planned batches need, against stock on hand and what drafted and sent orders bring, by preferred supplier.
          Orders round up to the supplier&apos;s packs and minimum order.
        </p>
      </div>
      {planned.length === 0 ? (
        <p className="text-cocoa-500">No planned batch.</p>
      ) : (
        <Card>
          <form method="get" className="space-y-3" aria-label="Choose batches">
            <p className="text-sm font-semibold text-cocoa-700">Planned batches</p>
            <div className="grid gap-2 sm:grid-cols-2 lg:grid-cols-3">
              {planned.map((b) => (
                <label key={b.id} className="flex items-center gap-2 text-sm">
                  <input type="checkbox" name="batch" value={b.id} defaultChecked={chosen.includes(b.id)} className="h-4 w-4 accent-pod" />
                  <span>
                    <span className="font-semibold">{b.code}</span> {b.recipeName} · {formatGrams(b.totalMassGrams, "100")} · {formatDate(b.plannedFor)}
                  </span>
                </label>
              ))}
            </div>
            <Button type="submit" variant="secondary" size="sm">
              Show requirements
            </Button>
          </form>
        </Card>
      )}
      {groups.map((g) => (
        <RequirementsGroup key={g.supplierId ?? "none"} group={g} batchIds={chosen} canBuy={can(viewer.role, "purchases.manage")} showPrices={costsShown} />
      ))}
    </div>
  );
}
