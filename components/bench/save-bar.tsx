"use client";

import { Button } from "@/components/ui/button";
import { Input } from "@/components/ui/input";

/** The draft's state and the one way to make it a version. */
export function SaveBar({
  baseVersionNo,
  dirty,
  saving,
  note,
  error,
  onNote,
  onSave,
}: {
  baseVersionNo: number;
  dirty: boolean;
  saving: boolean;
  note: string;
  error: string | null;
  onNote: (note: string) => void;
  onSave: () => void;
}) {
  const next = baseVersionNo + 1;
  return (
    <div className="mt-4 rounded-lg border border-sand bg-cream p-3">
      <div className="flex flex-wrap items-center gap-3">
        <label htmlFor="version-note" className="sr-only">
          Note for v{next}
        </label>
        <Input
          id="version-note"
          placeholder={`What changed in v${next}? (optional)`}
          maxLength={500}
          value={note}
          onChange={(e) => onNote(e.target.value)}
          className="h-9 min-w-0 flex-1"
        />
        <Button onClick={onSave} disabled={!dirty || saving}>
          {saving ? "Saving…" : `Save as v${next}`}
        </Button>
      </div>
      <p className="mt-2 text-xs text-cocoa-500" data-testid="draft-status">
        {dirty
          ? `Draft: unsaved changes${baseVersionNo ? ` since v${baseVersionNo}` : ""}, kept in this browser until you save.`
          : baseVersionNo
            ? `No changes since v${baseVersionNo}.`
            : "Nothing saved yet: add lines and save v1."}
      </p>
      {error ? (
        <p role="alert" className="mt-2 rounded-lg bg-brick-light px-3 py-2 text-sm text-brick" data-testid="save-error">
          {error}
        </p>
      ) : null}
    </div>
  );
}
