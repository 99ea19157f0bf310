import Link from "next/link";
import { Badge } from "@/components/ui/badge";
import { Table, Td, Th } from "@/components/ui/table";
import { lineDeviation, sumGrams } from "@/lib/batches/deviation";
import { formatGrams } from "@/lib/batches/format-mass";
import type { BatchDetail } from "@/lib/data/batches";

/** A clock time as typed on the run form (kept as the kitchen's wall clock). */
export const wallClock = (d: Date) => d.toISOString().slice(0, 16).replace("T", " ");

/** What the run used, line by line, against the plan; lines beyond the tolerance are flagged. */
export function RunRecord({ batch }: { batch: BatchDetail & { run: NonNullable<BatchDetail["run"]> } }) {
  const { run } = batch;
  const step = batch.resolutionGrams;
  const rows = batch.lines.map((line) => {
    const portions = run.portions.filter((p) => p.batchLineId === line.id);
    const actual = sumGrams(portions.map((p) => p.actualGrams));
    return { line, portions, actual, deviation: lineDeviation({ plannedGrams: line.massGrams, actualGrams: actual, tolerancePercent: run.tolerancePercent, resolutionGrams: step }) };
  });
  const flagged = rows.filter((r) => r.deviation.flagged).length;
  return (
    <div className="space-y-4">
      <p className="text-sm text-cocoa-700">
        {wallClock(run.startedAt)} – {wallClock(run.endedAt)}
        {run.recordedByName ? `, recorded by ${run.recordedByName}` : ""}. Tolerance {run.tolerancePercent} %:{" "}
        {flagged === 0 ? <Badge tone="meets">every line within it</Badge> : <Badge tone="short">{flagged === 1 ? "1 line off plan" : `${flagged} lines off plan`}</Badge>}
      </p>
      <Table data-testid="run-record">
        <thead>
          <tr>
            <Th>Ingredient</Th>
            <Th numeric>Planned</Th>
            <Th numeric>Actual</Th>
            <Th numeric>Difference</Th>
            <Th>Lots</Th>
          </tr>
        </thead>
        <tbody>
          {rows.map(({ line, portions, actual, deviation }) => (
            <tr key={line.id} data-flagged={deviation.flagged || undefined}>
              <Td>{line.ingredientName}</Td>
              <Td numeric>{formatGrams(line.massGrams, step)}</Td>
              <Td numeric>{formatGrams(actual, step)}</Td>
              <Td numeric className={deviation.flagged ? "font-semibold text-brick" : undefined}>
                {deviation.differencePercent === null ? "—" : deviation.differenceGrams === "0" ? "0 %" : `${deviation.differencePercent.startsWith("-") ? "" : "+"}${deviation.differencePercent} %`}
                {deviation.flagged ? <Badge tone="short" className="ml-2">off plan</Badge> : null}
              </Td>
              <Td>
                {portions
                  .filter((p) => p.lotCode)
                  .map((p, i) => (
                    <span key={p.id} className="mr-2 whitespace-nowrap">
                      {i > 0 ? "· " : ""}
                      {p.lotId ? (
                        <Link href={`/lots/${p.lotId}`} className="font-semibold text-pod-dark underline-offset-2 hover:underline">
                          {p.lotCode}
                        </Link>
                      ) : (
                        p.lotCode
                      )}{" "}
                      <span className="figures text-cocoa-500">{formatGrams(p.actualGrams, step)}</span>
                    </span>
                  ))}
              </Td>
            </tr>
          ))}
        </tbody>
      </Table>
      {run.notes ? <p className="text-sm text-cocoa-700">Notes: {run.notes}</p> : null}
    </div>
  );
}
