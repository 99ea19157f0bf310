"use client";

import { useRouter } from "next/navigation";
import { useRef, useState, useTransition } from "react";
import { switchWorkspaceAction } from "@/app/(app)/actions";
import { Button } from "@/components/ui/button";

type Imported = {
  workspaceId: string;
  name: string;
  counts: Record<string, number>;
  files: number;
  skippedPeople: { name: string; email: string; role: string | null }[];
};

const plural = (n: number, one: string, many = `${one}s`) => `${n.toLocaleString("en-GB")} ${n === 1 ? one : many}`;

/**
 * Uploads an export file to POST /api/workspace/import and shows what the new
 * workspace holds, with a button to open it (the current workspace stays as it is).
 */
export function ImportWorkspaceForm({ maxMegabytes }: { maxMegabytes: number }) {
  const router = useRouter();
  const input = useRef<HTMLInputElement>(null);
  const [pending, start] = useTransition();
  const [problem, setProblem] = useState<string | null>(null);
  const [done, setDone] = useState<Imported | null>(null);

  const submit = () => {
    const file = input.current?.files?.[0];
    if (!file) return setProblem("Choose an export file (.json) first.");
    const body = new FormData();
    body.set("file", file);
    setProblem(null);
    setDone(null);
    start(async () => {
      const res = await fetch("/api/workspace/import", { method: "POST", body }).catch(() => null);
      const json = (await res?.json().catch(() => null)) as (Imported & { error?: { message?: string } }) | null;
      if (!res?.ok || !json) return setProblem(json?.error?.message ?? "The import did not reach the server. Nothing was imported; try again.");
      setDone(json);
      if (input.current) input.current.value = "";
    });
  };
  const open = (workspaceId: string) =>
    start(async () => {
      const r = await switchWorkspaceAction({ workspaceId });
      if (r.ok) router.push("/recipes");
      else setProblem(r.message);
    });

  return (
    <div className="space-y-4" data-testid="workspace-import">
      <div className="flex flex-wrap items-end gap-3">
        <label className="flex flex-col gap-1.5 text-sm font-semibold text-cocoa-700">
          Export file (.json, up to {maxMegabytes} MB)
          <input ref={input} type="file" accept="application/json,.json" className="text-sm font-normal" />
        </label>
        <Button variant="secondary" onClick={submit} disabled={pending}>
          {pending ? "Importing…" : "Import as a new workspace"}
        </Button>
      </div>
      {problem ? (
        <p role="alert" data-testid="form-error" className="rounded-lg bg-brick-light px-3 py-2 text-sm text-brick">
          {problem}
        </p>
      ) : null}
      {done ? (
        <div role="status" data-testid="import-done" className="space-y-3 rounded-lg bg-sage-light px-4 py-3 text-sm text-cocoa">
          <p>
            <strong>{done.name}</strong> is ready: {plural(done.counts.recipes ?? 0, "recipe")}, {plural(done.counts.ingredients ?? 0, "ingredient")},{" "}
            {plural(done.counts.suppliers ?? 0, "supplier")}, {plural(done.counts.bean_lots ?? 0, "bean lot")}, {plural(done.counts.batches ?? 0, "batch", "batches")}{" "}
            and {plural(done.files, "file")}. You are its only member, as owner.
          </p>
          {done.skippedPeople.length > 0 ? (
            <p>
              Not added (invite them from Team in the new workspace if they should have access):{" "}
              {done.skippedPeople.map((p) => `${p.name} (${p.role ?? "former member"})`).join(", ")}.
            </p>
          ) : null}
          <Button onClick={() => open(done.workspaceId)} disabled={pending}>
            Open {done.name}
          </Button>
        </div>
      ) : null}
    </div>
  );
}
