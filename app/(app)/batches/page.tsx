import type { Metadata } from "next";
import Link from "next/link";
import { BatchLinks } from "@/components/batches/batch-links";
import { BatchStatusBadge } from "@/components/batches/status-badge";
import { Table, Td, Th } from "@/components/ui/table";
import { formatGrams } from "@/lib/batches/format-mass";
import { requireViewer } from "@/lib/auth/current";
import { can } from "@/lib/auth/permissions";
import { listBatches } from "@/lib/data/batches";
import { formatDate } from "@/lib/format";

export const metadata: Metadata = { title: "Batches" };

export default async function BatchesPage() {
  const viewer = await requireViewer();
  const batches = await listBatches({ workspaceId: viewer.workspace.id });
  return (
    <div className="space-y-6">
      <div className="flex flex-wrap items-end justify-between gap-4">
        <div>
          <h1 className="text-3xl font-bold">Batches</h1>
          <p className="mt-2 max-w-2xl text-cocoa-700">
            A released recipe made at a size: split into machine loads, printed as a batch sheet, and recorded as a run
            with the lots it used.
          </p>
        </div>
        <BatchLinks canPlan={can(viewer.role, "batches.plan")} canBuy={can(viewer.role, "purchases.manage")} canManageMachines={can(viewer.role, "machines.manage")} />
      </div>
      {batches.length === 0 ? (
        <p className="text-cocoa-500">No batch yet.</p>
      ) : (
        <Table>
          <thead>
            <tr>
              <Th>Batch</Th>
              <Th>Recipe</Th>
              <Th>Planned for</Th>
              <Th numeric>Mass</Th>
              <Th numeric>Loads</Th>
              <Th>Status</Th>
            </tr>
          </thead>
          <tbody>
            {batches.map((b) => (
              <tr key={b.id} data-testid={`batch-${b.code}`}>
                <Td>
                  <Link href={`/batches/${b.id}`} className="font-semibold text-pod-dark underline-offset-2 hover:underline">
                    {b.code}
                  </Link>
                </Td>
                <Td>
                  {b.recipeName} <span className="text-cocoa-500">v{b.versionNo}</span>
                </Td>
                <Td>{formatDate(b.plannedFor)}</Td>
                <Td numeric>{formatGrams(b.totalMassGrams, "100")}</Td>
                <Td numeric>
                  {b.loadCount}
                  {b.machineName ? <span className="block text-xs text-cocoa-500">{b.machineName}</span> : null}
                </Td>
                <Td>
                  <BatchStatusBadge status={b.status} />
                </Td>
              </tr>
            ))}
          </tbody>
        </Table>
      )}
    </div>
  );
}
