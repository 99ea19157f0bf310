"use client";

import { Button } from "@/components/ui/button";
import { Dialog } from "@/components/ui/dialog";
import type { CompositionFigures } from "@/lib/formulation";
import { diffComposition, diffLines, type DiffRow } from "@/lib/recipes/diff";
import { money, pct, signed } from "@/lib/recipes/format";

/** The version someone else saved, as GET /api/recipes/:id/versions/latest returns it. */
export type TheirVersion = {
  versionNo: number;
  note: string | null;
  authorName: string | null;
  createdAt: string;
  costPerBar: string | null;
  lines: { ingredientId: string; name: string; percent: string }[];
  evaluation: { composition: CompositionFigures };
};

export type MyDraft = {
  baseVersionNo: number;
  lines: { ingredientId: string; name: string; percent: string }[];
  composition: CompositionFigures;
  costPerBar: string | null;
};

const timeFormat = new Intl.DateTimeFormat("en-GB", { day: "numeric", month: "short", hour: "2-digit", minute: "2-digit" });

function DiffTable({ caption, rows, mine, theirs }: { caption: string; rows: DiffRow[]; mine: string; theirs: string }) {
  return (
    <table className="w-full text-sm">
      <caption className="mb-1 text-left font-semibold">{caption}</caption>
      <thead>
        <tr className="text-xs text-cocoa-500">
          <th className="text-left font-semibold" />
          <th className="text-right font-semibold">{mine}</th>
          <th className="text-right font-semibold">{theirs}</th>
          <th className="text-right font-semibold">Theirs − mine</th>
        </tr>
      </thead>
      <tbody>
        {rows.map((r) => (
          <tr key={r.key} className={r.changed ? "bg-pod-light/60" : undefined}>
            <td className="py-0.5">{r.label}</td>
            <td className="figures text-right">{pct(r.a)}</td>
            <td className="figures text-right">{pct(r.b)}</td>
            <td className="figures text-right">{r.delta === null ? "—" : `${signed(r.delta)} %`}</td>
          </tr>
        ))}
      </tbody>
    </table>
  );
}

/**
 * Someone saved a version after the one this draft started from. Both are shown
 * side by side; the user keeps theirs, or saves the draft on top of it. Nothing
 * is overwritten either way: a save is always a new version.
 */
export function ConflictDialog({
  mine,
  theirs,
  currency,
  busy,
  onSaveMine,
  onTakeTheirs,
  onClose,
}: {
  mine: MyDraft;
  theirs: TheirVersion;
  currency: string;
  busy: boolean;
  onSaveMine: () => void;
  onTakeTheirs: () => void;
  onClose: () => void;
}) {
  const mineLabel = `Your draft (from v${mine.baseVersionNo})`;
  const theirsLabel = `v${theirs.versionNo}`;
  const composition = diffComposition(mine.composition, theirs.evaluation.composition).filter((r) => r.key !== "cocoaSolidsStatement");
  return (
    <Dialog
      open
      onOpenChange={(open) => (open ? undefined : onClose())}
      title={`v${theirs.versionNo} was saved while you worked`}
      description={`${theirs.authorName ?? "Someone"} saved v${theirs.versionNo} on ${timeFormat.format(new Date(theirs.createdAt))}${theirs.note ? `: “${theirs.note}”` : ""}. Your draft is kept; choose what to do.`}
    >
      <div className="max-h-[60vh] space-y-4 overflow-y-auto" data-testid="conflict-dialog">
        <DiffTable caption="Lines" rows={diffLines(mine.lines, theirs.lines)} mine={mineLabel} theirs={theirsLabel} />
        <DiffTable caption="Composition" rows={composition} mine={mineLabel} theirs={theirsLabel} />
        <p className="text-sm">
          Cost per bar: yours <span className="figures font-semibold">{money(mine.costPerBar, currency, 3)}</span>, {theirsLabel}{" "}
          <span className="figures font-semibold">{money(theirs.costPerBar, currency, 3)}</span>
        </p>
      </div>
      <div className="mt-4 flex flex-wrap justify-end gap-2">
        <Button variant="quiet" onClick={onClose} disabled={busy}>
          Keep editing
        </Button>
        <Button variant="secondary" onClick={onTakeTheirs} disabled={busy}>
          Use v{theirs.versionNo}, drop my draft
        </Button>
        <Button onClick={onSaveMine} disabled={busy}>
          Save mine as v{theirs.versionNo + 1}
        </Button>
      </div>
    </Dialog>
  );
}
