import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { BatchFacts } from "@/components/batches/batch-facts";
import { CancelBatchButton } from "@/components/batches/cancel-batch-button";
import { PlanLines } from "@/components/batches/plan-lines";
import { RunForm } from "@/components/batches/run-form";
import { RunRecord } from "@/components/batches/run-record";
import { BatchStatusBadge } from "@/components/batches/status-badge";
import { Button } from "@/components/ui/button";
import { Card, CardHeader } from "@/components/ui/card";
import { requireViewer } from "@/lib/auth/current";
import { inWeighingOrder } from "@/lib/batches/weighing-order";
import { can } from "@/lib/auth/permissions";
import { getBatch, type BatchDetail } from "@/lib/data/batches";
import { getNibStock } from "@/lib/data/nib-stock";
import { AppError } from "@/lib/errors";
import { idSchema } from "@/lib/validation/auth";

export const metadata: Metadata = { title: "Batch" };

export default async function BatchPage({ params }: { params: Promise<{ batchId: string }> }) {
  const viewer = await requireViewer();
  const { batchId } = await params;
  if (!idSchema.safeParse(batchId).success) notFound();
  let batch: BatchDetail;
  try {
    batch = await getBatch({ workspaceId: viewer.workspace.id, batchId });
  } catch (err) {
    if (err instanceof AppError && err.code === "not_found") notFound();
    throw err;
  }
  const canPlan = can(viewer.role, "batches.plan");
  const recording = canPlan && batch.status === "planned";
  const stock = recording ? [...(await getNibStock({ workspaceId: viewer.workspace.id })).values()].filter((s) => Number(s.inStockKg) > 0) : [];
  return (
    <div className="space-y-8">
      <div className="flex flex-wrap items-start justify-between gap-4">
        <div>
          <p className="text-sm font-semibold uppercase tracking-widest text-pod-dark">
            <Link href="/batches">Batch</Link>
          </p>
          <h1 className="mt-1 flex items-center gap-3 text-3xl font-bold">
            <span data-testid="batch-code">{batch.code}</span> <BatchStatusBadge status={batch.status} />
          </h1>
        </div>
        {canPlan ? (
          <div className="flex flex-wrap gap-2">
            <Button asChild variant="secondary">
              <Link href={`/print/batches/${batch.id}`} target="_blank">
                Batch sheet
              </Link>
            </Button>
            <Button asChild variant="secondary">
              <a href={`/api/batches/${batch.id}/pdf?paper=a4`}>PDF (A4)</a>
            </Button>
            <Button asChild variant="secondary">
              <a href={`/api/batches/${batch.id}/pdf?paper=letter`}>PDF (US Letter)</a>
            </Button>
            {batch.status === "planned" ? <CancelBatchButton batchId={batch.id} /> : null}
          </div>
        ) : null}
      </div>
      <BatchFacts batch={batch} />
      {batch.scaleNotes.length ? (
        <ul className="space-y-1 rounded-md bg-pod-light px-3 py-2 text-sm text-pod-dark" role="note">
          {batch.scaleNotes.map((n) => (
            <li key={n}>{n}</li>
          ))}
        </ul>
      ) : null}
      <Card>
        <CardHeader title="Plan" description="Masses from the recipe's released version, in whole scale steps; they add up to the batch exactly." />
        <PlanLines batch={batch} />
      </Card>
      {batch.run ? (
        <Card>
          <CardHeader title="Run" description="What was actually weighed, and from which lots." />
          <RunRecord batch={{ ...batch, run: batch.run }} />
        </Card>
      ) : recording ? (
        <Card>
          <CardHeader title="Record the run" description="From the filled-in batch sheet: actual masses and lot codes." />
          <RunForm
            batchId={batch.id}
            resolutionGrams={batch.resolutionGrams}
            lines={inWeighingOrder(batch.lines).map((l) => ({ id: l.id, ingredientName: l.ingredientName, ingredientKind: l.ingredientKind, massGrams: l.massGrams }))}
            lotCodes={stock.map((s) => ({ code: s.code, inStockKg: s.inStockKg }))}
          />
        </Card>
      ) : null}
    </div>
  );
}
