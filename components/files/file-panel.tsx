"use client";

import { useRef, useState, useTransition } from "react";
import useSWR from "swr";
import { fetchJson } from "@/components/data/fetch-json";
import { Button } from "@/components/ui/button";
import { Select } from "@/components/ui/select";
import type { AttachmentRecord } from "@/lib/data/attachments";
import { formatDate } from "@/lib/format";

const KIND_LABEL = { spec_sheet: "Spec sheet", certificate: "Certificate", lab_report: "Lab report", other: "Other" } as const;
type Kind = keyof typeof KIND_LABEL;
// A bean lot has no spec sheet; ingredients and suppliers keep their three kinds.
const KINDS_OF: Record<"ingredients" | "suppliers" | "lots", Kind[]> = {
  ingredients: ["spec_sheet", "certificate", "other"],
  suppliers: ["spec_sheet", "certificate", "other"],
  lots: ["certificate", "lab_report", "other"],
};
const size = (n: number) => (n >= 1024 * 1024 ? `${(n / (1024 * 1024)).toFixed(1)} MB` : `${Math.max(1, Math.round(n / 1024))} KB`);

async function send(url: string, init: RequestInit): Promise<string | null> {
  const res = await fetch(url, init);
  if (res.ok) return null;
  const body = (await res.json().catch(() => null)) as { error?: { message?: string; fieldErrors?: Record<string, string[]> } } | null;
  return body?.error?.fieldErrors?.file?.[0] ?? body?.error?.message ?? `The upload failed (${res.status}).`;
}

/**
 * Spec sheets, certificates and lab reports of one ingredient, supplier or
 * bean lot: list, download
 * (members only, through /api/files), attach (PDF, PNG, JPEG up to 10 MB,
 * checked by content on the server) and remove.
 */
export function FilePanel({ owner, canEdit }: { owner: { kind: "ingredients" | "suppliers" | "lots"; id: string }; canEdit: boolean }) {
  const key = `/api/${owner.kind}/${owner.id}/files`;
  const kinds = KINDS_OF[owner.kind];
  const kindOptions = kinds.map((value) => ({ value, label: KIND_LABEL[value] }));
  const { data, error, mutate } = useSWR(key, fetchJson<{ files: AttachmentRecord[] }>);
  const [message, setMessage] = useState<{ ok: boolean; text: string } | null>(null);
  const [kind, setKind] = useState<string>(kinds[0]!);
  const [pending, start] = useTransition();
  const input = useRef<HTMLInputElement>(null);

  const upload = () => {
    const file = input.current?.files?.[0];
    if (!file) return setMessage({ ok: false, text: "Choose a file first." });
    const body = new FormData();
    body.set("file", file);
    body.set("kind", kind);
    start(async () => {
      const problem = await send(key, { method: "POST", body });
      setMessage(problem ? { ok: false, text: problem } : { ok: true, text: `${file.name} is attached.` });
      if (!problem && input.current) input.current.value = "";
      await mutate();
    });
  };
  const remove = (f: AttachmentRecord) =>
    start(async () => {
      const problem = await send(`${key}/${f.id}`, { method: "DELETE" });
      setMessage(problem ? { ok: false, text: problem } : { ok: true, text: `${f.fileName} was removed.` });
      await mutate();
    });

  return (
    <div className="space-y-4" data-testid="file-panel">
      {error ? <p className="text-sm text-brick">Files could not be loaded: {error.message}</p> : null}
      {data && data.files.length === 0 ? <p className="text-sm text-cocoa-500">No file attached yet.</p> : null}
      <ul className="divide-y divide-sand-light">
        {data?.files.map((f) => (
          <li key={f.id} className="flex items-center justify-between gap-4 py-2 text-sm">
            <div>
              <a href={`/api/files/${f.id}`} className="font-semibold text-pod-dark underline-offset-2 hover:underline">
                {f.fileName}
              </a>
              <span className="ml-2 text-cocoa-500">
                {KIND_LABEL[f.kind]} · {f.contentType.replace(/^.*\//, "").toUpperCase()} · {size(f.sizeBytes)} · {formatDate(f.createdAt)}
                {f.uploadedByName ? ` · ${f.uploadedByName}` : ""}
              </span>
            </div>
            {canEdit ? (
              <Button variant="quiet" size="sm" disabled={pending} onClick={() => remove(f)} aria-label={`Remove ${f.fileName}`}>
                Remove
              </Button>
            ) : null}
          </li>
        ))}
      </ul>
      {message ? (
        <p role={message.ok ? "status" : "alert"} className={message.ok ? "text-sm text-sage" : "rounded-lg bg-brick-light px-3 py-2 text-sm text-brick"}>
          {message.text}
        </p>
      ) : null}
      {canEdit ? (
        <div className="flex flex-wrap items-end gap-3">
          <label className="flex flex-col gap-1.5 text-sm font-semibold text-cocoa-700">
            File (PDF, PNG or JPEG, up to 10 MB)
            <input ref={input} type="file" accept="application/pdf,image/png,image/jpeg" className="text-sm font-normal" />
          </label>
          <div className="w-44">
            <Select value={kind} onValueChange={setKind} options={kindOptions} ariaLabel="Kind of file" />
          </div>
          <Button variant="secondary" onClick={upload} disabled={pending}>
            {pending ? "Attaching…" : "Attach file"}
          </Button>
        </div>
      ) : null}
    </div>
  );
}
