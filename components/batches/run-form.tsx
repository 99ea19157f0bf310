"use client";

import { useRouter } from "next/navigation";
import { useState, useTransition } from "react";
import { recordRunAction } from "@/app/(app)/batches/actions";
import { FormAlert } from "@/components/forms/form-alert";
import { Button } from "@/components/ui/button";
import { Field } from "@/components/ui/field";
import { Input } from "@/components/ui/input";
import { NumberField } from "@/components/ui/number-field";
import { formatGrams } from "@/lib/batches/format-mass";

type Line = { id: string; ingredientName: string; ingredientKind: string; massGrams: string };
type Row = { key: number; batchLineId: string; actual: string; lotCode: string };
type Failure = { message: string; fieldErrors?: Record<string, string[] | undefined> };

// Lines planned at a kilo or more are entered in kg, smaller ones in g (as the sheet prints them).
const unitOf = (line: Line) => (Number(line.massGrams) >= 1000 ? "kg" : "g");

/**
 * Records the run from the filled-in sheet: actual mass and lot code per line
 * (a line can take several lots: "Add a lot"), times, tolerance and notes.
 */
export function RunForm({ batchId, lines, resolutionGrams, lotCodes }: { batchId: string; lines: Line[]; resolutionGrams: string; lotCodes: { code: string; inStockKg: string }[] }) {
  const router = useRouter();
  const [rows, setRows] = useState<Row[]>(() => lines.map((l, i) => ({ key: i, batchLineId: l.id, actual: "", lotCode: "" })));
  const [times, setTimes] = useState({ startedAt: "", endedAt: "", tolerancePercent: "2", notes: "" });
  const [failure, setFailure] = useState<Failure | null>(null);
  const [pending, start] = useTransition();
  const lineById = new Map(lines.map((l) => [l.id, l]));
  const update = (key: number, patch: Partial<Row>) => setRows((rs) => rs.map((r) => (r.key === key ? { ...r, ...patch } : r)));
  const addLot = (after: Row) =>
    setRows((rs) => {
      const i = rs.findIndex((r) => r.key === after.key);
      const next = { key: Math.max(...rs.map((r) => r.key)) + 1, batchLineId: after.batchLineId, actual: "", lotCode: "" };
      return [...rs.slice(0, i + 1), next, ...rs.slice(i + 1)];
    });
  const rowError = (index: number) =>
    failure?.fieldErrors?.[`portions.${index}.actual`]?.[0] ?? failure?.fieldErrors?.[`portions.${index}.lotCode`]?.[0] ?? failure?.fieldErrors?.[`portions.${index}.batchLineId`]?.[0];
  const submit = () =>
    start(async () => {
      setFailure(null);
      const result = await recordRunAction({
        batchId,
        ...times,
        portions: rows.map((r) => ({ batchLineId: r.batchLineId, actual: r.actual.trim().replace(",", "."), unit: unitOf(lineById.get(r.batchLineId)!), lotCode: r.lotCode })),
      });
      if (result.ok) router.refresh();
      else setFailure(result);
    });
  return (
    <form
      className="space-y-5"
      noValidate
      aria-label="Record the run"
      onSubmit={(e) => {
        e.preventDefault();
        submit();
      }}
    >
      <FormAlert result={failure ? { ok: false, message: failure.message } : null} />
      <datalist id="bean-lot-codes">
        {lotCodes.map((l) => (
          <option key={l.code} value={l.code}>{`${l.inStockKg} kg of nibs in stock`}</option>
        ))}
      </datalist>
      <table className="w-full text-sm">
        <thead>
          <tr className="text-left text-xs uppercase tracking-wide text-cocoa-500">
            <th className="py-2 font-semibold">Ingredient</th>
            <th className="py-2 text-right font-semibold">Planned</th>
            <th className="w-40 py-2 pl-3 font-semibold">Actual</th>
            <th className="w-48 py-2 pl-3 font-semibold">Lot code</th>
            <th className="py-2" />
          </tr>
        </thead>
        <tbody>
          {rows.map((r, i) => {
            const line = lineById.get(r.batchLineId)!;
            const first = rows.findIndex((x) => x.batchLineId === r.batchLineId) === i;
            const error = rowError(i);
            const nibs = line.ingredientKind === "nibs";
            return (
              <tr key={r.key} className="border-t border-sand-light align-top" data-testid={`run-row-${i}`}>
                <td className="py-2">{first ? line.ingredientName : <span className="text-cocoa-500">… another lot</span>}</td>
                <td className="figures py-2 text-right">{first ? formatGrams(line.massGrams, resolutionGrams) : ""}</td>
                <td className="py-2 pl-3">
                  <NumberField aria-label={`Actual ${line.ingredientName}${first ? "" : " (another lot)"}`} unit={unitOf(line)} value={r.actual} onChange={(e) => update(r.key, { actual: e.target.value })} />
                </td>
                <td className="py-2 pl-3">
                  <Input
                    aria-label={`Lot code ${line.ingredientName}${first ? "" : " (another lot)"}`}
                    placeholder={nibs ? "Bean lot (required)" : "Supplier's lot"}
                    list={nibs ? "bean-lot-codes" : undefined}
                    value={r.lotCode}
                    onChange={(e) => update(r.key, { lotCode: e.target.value })}
                  />
                  {error ? (
                    <p role="alert" className="mt-1 text-sm text-brick">
                      {error}
                    </p>
                  ) : null}
                </td>
                <td className="py-2 pl-2">
                  <Button size="sm" variant="quiet" onClick={() => addLot(r)}>
                    Add a lot
                  </Button>
                </td>
              </tr>
            );
          })}
        </tbody>
      </table>
      <div className="grid gap-4 sm:grid-cols-3">
        <Field id="startedAt" label="Started" error={failure?.fieldErrors?.startedAt?.[0]}>
          <Input id="startedAt" type="datetime-local" value={times.startedAt} onChange={(e) => setTimes((t) => ({ ...t, startedAt: e.target.value }))} />
        </Field>
        <Field id="endedAt" label="Ended" error={failure?.fieldErrors?.endedAt?.[0]}>
          <Input id="endedAt" type="datetime-local" value={times.endedAt} onChange={(e) => setTimes((t) => ({ ...t, endedAt: e.target.value }))} />
        </Field>
        <Field id="tolerancePercent" label="Tolerance" hint="A line further off its plan than this is flagged (your own figure)." error={failure?.fieldErrors?.tolerancePercent?.[0]}>
          <NumberField id="tolerancePercent" unit="%" value={times.tolerancePercent} onChange={(e) => setTimes((t) => ({ ...t, tolerancePercent: e.target.value }))} />
        </Field>
      </div>
      <Field id="runNotes" label="Notes" error={failure?.fieldErrors?.notes?.[0]}>
        <Input id="runNotes" value={times.notes} onChange={(e) => setTimes((t) => ({ ...t, notes: e.target.value }))} />
      </Field>
      <p className="text-sm text-cocoa-500">Completing the run takes the nibs off their bean lots. It is recorded once and cannot be edited.</p>
      <Button type="submit" disabled={pending}>
        {pending ? "Recording…" : "Complete the run"}
      </Button>
    </form>
  );
}
