"use client";

import { useState, useTransition } from "react";
import { refreshLists } from "@/components/data/fetch-json";
import { Button } from "@/components/ui/button";
import { Field } from "@/components/ui/field";
import { Input } from "@/components/ui/input";
import { Select, type SelectOption } from "@/components/ui/select";
import type { ImportOutcome } from "@/lib/data/price-list-imports";
import type { PriceListCheck } from "@/lib/price-lists/check";
import { DATE_FORMATS, type ColumnMapping } from "@/lib/price-lists/fields";
import { MAX_PRICE_LIST_BYTES, MAX_PRICE_LIST_ROWS } from "@/lib/price-lists/limits";
import { ColumnMapper } from "./column-mapper";
import { PriceListVerdicts } from "./price-list-verdicts";

type Problem = { message: string; fieldErrors: Record<string, string[] | undefined> };
type Options = { decimalSeparator: "." | ","; dateFormat: string; defaultValidFrom: string };

async function post<T>(url: string, body: FormData): Promise<{ ok: true; data: T } | { ok: false; problem: Problem }> {
  const res = await fetch(url, { method: "POST", body });
  const json = (await res.json().catch(() => null)) as (T & { error?: { message: string; fieldErrors?: Record<string, string[]> } }) | null;
  if (res.ok && json) return { ok: true, data: json };
  return { ok: false, problem: { message: json?.error?.fieldErrors?.file?.[0] ?? json?.error?.message ?? `The server answered ${res.status}.`, fieldErrors: json?.error?.fieldErrors ?? {} } };
}

/**
 * The price-list upload: choose the supplier and the CSV file, read it (the
 * server guesses the column mapping), confirm or change the mapping and see
 * every row's verdict, then import the valid rows in one transaction. The file
 * stays in the browser between steps and is sent again each time, so nothing
 * is stored before the import.
 */
export function PriceListUpload({ suppliers, initialSupplierId, today }: { suppliers: SelectOption[]; initialSupplierId?: string; today: string }) {
  const [supplierId, setSupplierId] = useState(initialSupplierId ?? "");
  const [file, setFile] = useState<File | null>(null);
  const [options, setOptions] = useState<Options>({ decimalSeparator: ".", dateFormat: "YYYY-MM-DD", defaultValidFrom: today });
  const [check, setCheck] = useState<PriceListCheck | null>(null);
  const [mapping, setMapping] = useState<ColumnMapping | null>(null);
  const [problem, setProblem] = useState<Problem | null>(null);
  const [outcome, setOutcome] = useState<ImportOutcome | null>(null);
  const [pending, start] = useTransition();
  const unmapped = check ? Object.keys(check.mappingProblems).length > 0 : false;

  const body = (withMapping: ColumnMapping | null, opts: Options) => {
    const f = new FormData();
    f.set("supplierId", supplierId);
    if (file) f.set("file", file);
    if (withMapping) f.set("mapping", JSON.stringify(withMapping));
    f.set("decimalSeparator", opts.decimalSeparator);
    f.set("dateFormat", opts.dateFormat);
    f.set("defaultValidFrom", opts.defaultValidFrom);
    return f;
  };
  const read = (withMapping: ColumnMapping | null, opts = options) => {
    if (!supplierId) return setProblem({ message: "Choose the supplier whose price list this is.", fieldErrors: {} });
    if (!file) return setProblem({ message: "Choose the CSV file to upload.", fieldErrors: {} });
    if (file.size > MAX_PRICE_LIST_BYTES) return setProblem({ message: `That file is larger than ${MAX_PRICE_LIST_BYTES / (1024 * 1024)} MB. Split it and upload the parts.`, fieldErrors: {} });
    start(async () => {
      const r = await post<PriceListCheck>("/api/price-lists/preview", body(withMapping, opts));
      setOutcome(null);
      if (!r.ok) return setProblem(r.problem);
      setProblem(null);
      setCheck(r.data);
      setMapping(r.data.mapping);
    });
  };
  const changeOptions = (next: Partial<Options>) => {
    const opts = { ...options, ...next };
    setOptions(opts);
    if (check) read(mapping, opts);
  };
  const runImport = () =>
    start(async () => {
      const r = await post<ImportOutcome>("/api/price-lists", body(mapping, options));
      if (!r.ok) return setProblem(r.problem);
      setProblem(null);
      setOutcome(r.data);
      setCheck(r.data.check);
      await refreshLists("/api/quotes", "/api/price-lists", "/api/ingredients", "/api/suppliers");
    });

  return (
    <div className="space-y-8">
      <section className="grid gap-4 md:grid-cols-[1fr_1fr_auto] md:items-end">
        <Field id="pl-supplier" label="Supplier">
          <Select id="pl-supplier" value={supplierId} onValueChange={(v) => { setSupplierId(v); setCheck(null); setOutcome(null); }} options={suppliers} placeholder="Choose…" ariaLabel="Supplier" />
        </Field>
        <Field id="pl-file" label="Price list (CSV)" hint={`Up to ${MAX_PRICE_LIST_BYTES / (1024 * 1024)} MB and ${MAX_PRICE_LIST_ROWS} rows; UTF-8 is best.`}>
          <input
            id="pl-file"
            type="file"
            accept=".csv,text/csv,text/plain"
            className="text-sm"
            onChange={(e) => { setFile(e.target.files?.[0] ?? null); setCheck(null); setOutcome(null); setProblem(null); }}
          />
        </Field>
        <Button onClick={() => read(null)} disabled={pending}>
          {pending && !check ? "Reading…" : "Read the file"}
        </Button>
      </section>

      {problem ? (
        <p role="alert" data-testid="price-list-error" className="rounded-lg bg-brick-light px-3 py-2 text-sm text-brick">
          {problem.message}
        </p>
      ) : null}

      {check && mapping ? (
        <>
          <section className="space-y-4">
            <h2 className="text-lg font-bold">1. Match the columns</h2>
            <p className="text-sm text-cocoa-500">
              {check.fileName}: {check.rowCount} rows, read as {check.encoding}, separated by “{check.delimiter === "\t" ? "tab" : check.delimiter}”.
              {check.sameFileImportedAt ? ` This same file was imported on ${check.sameFileImportedAt.slice(0, 10)}; its rows will not be added twice.` : ""}
            </p>
            <div className="grid gap-4 sm:grid-cols-3">
              <Field id="pl-decimal" label="Decimal mark">
                <Select id="pl-decimal" value={options.decimalSeparator} onValueChange={(v) => changeOptions({ decimalSeparator: v as "." | "," })} options={[{ value: ".", label: "Point: 1,234.50" }, { value: ",", label: "Comma: 1.234,50" }]} ariaLabel="Decimal mark" />
              </Field>
              <Field id="pl-dates" label="Dates written as">
                <Select id="pl-dates" value={options.dateFormat} onValueChange={(v) => changeOptions({ dateFormat: v })} options={DATE_FORMATS.map((d) => ({ value: d, label: d }))} ariaLabel="Dates written as" />
              </Field>
              <Field id="pl-from" label="Valid from, for rows without a date">
                <Input id="pl-from" type="date" value={options.defaultValidFrom} onChange={(e) => setOptions((o) => ({ ...o, defaultValidFrom: e.target.value }))} onBlur={() => changeOptions({})} />
              </Field>
            </div>
            <ColumnMapper
              headers={check.headers}
              sample={check.sample}
              mapping={mapping}
              errors={{ ...Object.fromEntries(Object.entries(check.mappingProblems).map(([f, m]) => [f, [m]])), ...(problem?.fieldErrors ?? {}) }}
              onChange={(m) => { setMapping(m); read(m); }}
            />
          </section>

          {unmapped ? (
            <p role="status" data-testid="price-list-counts" className="rounded-lg bg-pod-light px-3 py-2 text-sm text-pod-dark">
              Choose the ingredient and price columns above; every row is then checked.
            </p>
          ) : (
            <PriceListVerdicts check={check} outcome={outcome} pending={pending} onImport={runImport} />
          )}
        </>
      ) : null}
    </div>
  );
}
