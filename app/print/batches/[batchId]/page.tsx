import type { Metadata } from "next";
import { notFound } from "next/navigation";
import { BatchSheet } from "@/components/batches/batch-sheet";
import { PrintToolbar } from "@/components/batches/print-toolbar";
import { requireViewer } from "@/lib/auth/current";
import { can } from "@/lib/auth/permissions";
import { getBatch, type BatchDetail } from "@/lib/data/batches";
import { AppError } from "@/lib/errors";
import { idSchema } from "@/lib/validation/auth";

export const metadata: Metadata = { title: "Batch sheet" };

/** The batch sheet for paper (A4 by default, ?paper=letter). Printing is for those who plan batches. */
export default async function BatchSheetPage({ params, searchParams }: { params: Promise<{ batchId: string }>; searchParams: Promise<{ paper?: string }> }) {
  const viewer = await requireViewer();
  const [{ batchId }, { paper: paperParam }] = await Promise.all([params, searchParams]);
  if (!can(viewer.role, "batches.plan")) {
    return <p>Your role does not print batch sheets; production and the owner do.</p>;
  }
  if (!idSchema.safeParse(batchId).success) notFound();
  let batch: BatchDetail;
  try {
    batch = await getBatch({ workspaceId: viewer.workspace.id, batchId });
  } catch (err) {
    if (err instanceof AppError && err.code === "not_found") notFound();
    throw err;
  }
  const paper = paperParam === "letter" ? "letter" : "a4";
  return (
    <div className={paper === "letter" ? "paper-letter" : "paper-a4"}>
      <PrintToolbar batchId={batch.id} paper={paper} />
      <BatchSheet batch={batch} printedOn={new Date().toISOString().slice(0, 10)} />
    </div>
  );
}
