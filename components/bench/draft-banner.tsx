"use client";

import { Button } from "@/components/ui/button";

const timeFormat = new Intl.DateTimeFormat("en-GB", { day: "numeric", month: "short", hour: "2-digit", minute: "2-digit" });

/** Says that the bench shows a draft this browser kept, not the saved version. */
export function DraftBanner({ keptAt, baseVersionNo, latestVersionNo, onDiscard }: { keptAt: string; baseVersionNo: number; latestVersionNo: number; onDiscard: () => void }) {
  const stale = baseVersionNo !== latestVersionNo;
  return (
    <div role="status" className="flex flex-wrap items-center justify-between gap-3 rounded-card border border-pod/40 bg-pod-light p-4 text-sm" data-testid="draft-banner">
      <p>
        Your unsaved draft from {timeFormat.format(new Date(keptAt))} is back
        {baseVersionNo ? `, started from v${baseVersionNo}` : ""}.
        {stale ? ` v${latestVersionNo} has been saved since: saving will show you both.` : ""}
      </p>
      <Button size="sm" variant="secondary" onClick={onDiscard}>
        Discard draft
      </Button>
    </div>
  );
}
