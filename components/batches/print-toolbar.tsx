"use client";

import Link from "next/link";
import { Button } from "@/components/ui/button";

/** On screen only: print, switch paper, go back. */
export function PrintToolbar({ batchId, paper }: { batchId: string; paper: "a4" | "letter" }) {
  return (
    <div className="no-print mb-6 flex flex-wrap items-center gap-2 border-b border-sand pb-4">
      <Button onClick={() => window.print()}>Print</Button>
      <Button asChild variant="secondary">
        <Link href={`/print/batches/${batchId}?paper=${paper === "a4" ? "letter" : "a4"}`}>{paper === "a4" ? "Switch to US Letter" : "Switch to A4"}</Link>
      </Button>
      <Button asChild variant="quiet">
        <Link href={`/batches/${batchId}`}>Back to the batch</Link>
      </Button>
      <span className="text-sm text-cocoa-500">Paper: {paper === "a4" ? "A4" : "US Letter"}</span>
    </div>
  );
}
