import { Table, Td, Th } from "@/components/ui/table";
import { formatGrams } from "@/lib/batches/format-mass";
import { inWeighingOrder } from "@/lib/batches/weighing-order";
import type { BatchDetail } from "@/lib/data/batches";
import { formatPercent } from "@/lib/format";

/** The batch's lines in weighing order: the batch mass and, when split, the first load's share. */
export function PlanLines({ batch }: { batch: BatchDetail }) {
  const step = batch.resolutionGrams;
  const firstLoad = batch.loads[0];
  return (
    <Table data-testid="plan-lines">
      <thead>
        <tr>
          <Th>Ingredient</Th>
          <Th numeric>%</Th>
          <Th numeric>Batch</Th>
          {batch.loadCount > 1 ? <Th numeric>Load 1 of {batch.loadCount}</Th> : null}
        </tr>
      </thead>
      <tbody>
        {inWeighingOrder(batch.lines).map((l) => (
          <tr key={l.id}>
            <Td>{l.ingredientName}</Td>
            <Td numeric>{formatPercent(l.percent, 2)}</Td>
            <Td numeric>{formatGrams(l.massGrams, step)}</Td>
            {batch.loadCount > 1 ? <Td numeric>{formatGrams(firstLoad?.lineMassesGrams[l.position - 1] ?? "0", step)}</Td> : null}
          </tr>
        ))}
        <tr>
          <Td className="font-semibold">Total</Td>
          <Td numeric />
          <Td numeric className="font-semibold">
            {formatGrams(batch.totalMassGrams, step)}
          </Td>
          {batch.loadCount > 1 ? <Td numeric className="font-semibold">{formatGrams(firstLoad?.massGrams ?? "0", step)}</Td> : null}
        </tr>
      </tbody>
    </Table>
  );
}
