"use client";

import { useRouter } from "next/navigation";
import { useState, useTransition } from "react";
import { forkRecipeVersionAction, releaseRecipeVersionAction, restoreRecipeVersionAction } from "@/app/(app)/recipes/[recipeId]/actions";
import { FormAlert } from "@/components/forms/form-alert";
import { Button } from "@/components/ui/button";
import { Dialog } from "@/components/ui/dialog";
import { Field } from "@/components/ui/field";
import { Input } from "@/components/ui/input";
import { useToast } from "@/components/ui/toast";

type Props = { recipeId: string; recipeName: string; versionNo: number; latestVersionNo: number; isCurrentRelease: boolean };
type Failure = { ok: false; message: string; fieldErrors?: Record<string, string[] | undefined> } | null;

/** Release, restore as a new version, or fork into a new recipe: each asks first and says what it did. */
export function VersionActions({ recipeId, recipeName, versionNo, latestVersionNo, isCurrentRelease }: Props) {
  const router = useRouter();
  const toast = useToast();
  const [open, setOpen] = useState<"release" | "restore" | "fork" | null>(null);
  const [failure, setFailure] = useState<Failure>(null);
  const [pending, start] = useTransition();
  const [note, setNote] = useState("");
  const [name, setName] = useState(`${recipeName} (from v${versionNo})`);

  function run(work: () => Promise<{ ok: true; data: unknown } | { ok: false; message: string; fieldErrors?: Record<string, string[] | undefined> }>, done: (data: unknown) => void) {
    start(async () => {
      const r = await work();
      if (!r.ok) return setFailure({ ok: false, message: [r.message, ...Object.values(r.fieldErrors ?? {}).flat()].join(" ") });
      setFailure(null);
      setOpen(null);
      done(r.data);
    });
  }
  const dialog = (kind: "release" | "restore" | "fork", title: string, description: string, body: React.ReactNode, confirm: string, onConfirm: () => void) => (
    <Dialog open={open === kind} onOpenChange={(o) => (setFailure(null), setOpen(o ? kind : null))} title={title} description={description}>
      <div className="space-y-4">
        <FormAlert result={failure} />
        {body}
        <div className="flex justify-end gap-2">
          <Button variant="quiet" onClick={() => setOpen(null)}>
            Cancel
          </Button>
          <Button onClick={onConfirm} disabled={pending}>
            {pending ? "Working…" : confirm}
          </Button>
        </div>
      </div>
    </Dialog>
  );

  return (
    <div className="flex flex-wrap justify-end gap-1">
      {isCurrentRelease ? null : (
        <Button size="sm" variant="secondary" onClick={() => setOpen("release")}>
          Release
        </Button>
      )}
      {versionNo === latestVersionNo ? null : (
        <Button size="sm" variant="quiet" onClick={() => setOpen("restore")}>
          Restore
        </Button>
      )}
      <Button size="sm" variant="quiet" onClick={() => setOpen("fork")}>
        Fork
      </Button>
      {dialog(
        "release",
        `Release v${versionNo} for production?`,
        "Production will work from this version. The release is recorded; earlier releases stay in the history.",
        <Field id={`release-note-${versionNo}`} label="Note (optional)">
          <Input id={`release-note-${versionNo}`} value={note} maxLength={500} onChange={(e) => setNote(e.target.value)} />
        </Field>,
        `Release v${versionNo}`,
        () =>
          run(
            () => releaseRecipeVersionAction({ recipeId, versionNo, note: note || undefined }),
            () => (toast({ title: `v${versionNo} released`, tone: "success" }), router.refresh()),
          ),
      )}
      {dialog(
        "restore",
        `Restore v${versionNo}?`,
        `Its lines become v${latestVersionNo + 1}, on top of v${latestVersionNo}. Nothing is deleted; figures are recomputed with today's ingredient data and prices.`,
        null,
        `Restore as v${latestVersionNo + 1}`,
        () =>
          run(
            () => restoreRecipeVersionAction({ recipeId, versionNo, baseVersionNo: latestVersionNo }),
            (data) => (toast({ title: `Restored as v${(data as { versionNo: number }).versionNo}`, tone: "success" }), router.refresh()),
          ),
      )}
      {dialog(
        "fork",
        `Fork v${versionNo} into a new recipe`,
        "The new recipe starts with these lines as its v1; this recipe is not changed.",
        <Field id={`fork-name-${versionNo}`} label="Name of the new recipe">
          <Input id={`fork-name-${versionNo}`} value={name} maxLength={120} onChange={(e) => setName(e.target.value)} />
        </Field>,
        "Create the recipe",
        () => run(() => forkRecipeVersionAction({ recipeId, versionNo, name }), (data) => router.push(`/recipes/${(data as { recipeId: string }).recipeId}`)),
      )}
    </div>
  );
}
