import Link from "next/link";
import { Card, CardHeader } from "@/components/ui/card";
import { Table, Td, Th } from "@/components/ui/table";
import { formatGrams } from "@/lib/batches/format-mass";
import { getLotNibStock } from "@/lib/data/nib-stock";
import { batchesUsingLot } from "@/lib/data/traceability";
import { formatKg } from "@/lib/format";
import { wallClock } from "./run-record";

/**
 * The recall view of a bean lot: its nibs in stock and every batch whose run
 * used it. Mounted on the lot's page with one line.
 */
export async function LotBatches({ workspaceId, lotId }: { workspaceId: string; lotId: string }) {
  const [uses, stock] = await Promise.all([batchesUsingLot({ workspaceId, lotId }), getLotNibStock({ workspaceId, lotId })]);
  const batches = new Set(uses.map((u) => u.batchId)).size;
  return (
    <Card data-testid="lot-batches">
      <CardHeader
        title="Batches that used this lot"
        description={batches === 0 ? "No completed run has used this lot yet." : `${batches === 1 ? "1 batch" : `${batches} batches`}: the list to work from if this lot is recalled.`}
      />
      {stock ? (
        <p className="mb-4 text-sm text-cocoa-700">
          Nibs in stock: <span className="figures font-semibold" data-testid="lot-nibs-in-stock">{stock.winnowed ? formatKg(stock.inStockKg, 1) : "none yet (not winnowed)"}</span>
          {stock.winnowed ? ` (${formatKg(stock.producedKg, 1)} from winnowing, ${formatKg(stock.usedKg, 1)} used in runs)` : ""}
        </p>
      ) : null}
      {uses.length ? (
        <Table>
          <thead>
            <tr>
              <Th>Batch</Th>
              <Th>Recipe</Th>
              <Th>Run ended</Th>
              <Th>As</Th>
              <Th numeric>Taken</Th>
            </tr>
          </thead>
          <tbody>
            {uses.map((u) => (
              <tr key={`${u.batchId}-${u.ingredientName}`}>
                <Td>
                  <Link href={`/batches/${u.batchId}`} className="font-semibold text-pod-dark underline-offset-2 hover:underline">
                    {u.code}
                  </Link>
                </Td>
                <Td>
                  {u.recipeName} <span className="text-cocoa-500">v{u.versionNo}</span>
                </Td>
                <Td>{wallClock(u.endedAt)}</Td>
                <Td>{u.ingredientName}</Td>
                <Td numeric>{formatGrams(u.grams, "100")}</Td>
              </tr>
            ))}
          </tbody>
        </Table>
      ) : null}
    </Card>
  );
}
