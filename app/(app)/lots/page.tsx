import type { Metadata } from "next";
import Link from "next/link";
import { Badge } from "@/components/ui/badge";
import { Button } from "@/components/ui/button";
import { Table, Td, Th } from "@/components/ui/table";
import { requireViewer } from "@/lib/auth/current";
import { can } from "@/lib/auth/permissions";
import { listLotsForViewer } from "@/lib/cost-visibility/lots";
import { getNibStock } from "@/lib/data/nib-stock";
import { getWorkspaceBaseCurrency } from "@/lib/data/workspaces";
import { formatDate, formatKg, formatMoney, formatPercent } from "@/lib/format";

export const metadata: Metadata = { title: "Bean lots" };

export default async function LotsPage() {
  const viewer = await requireViewer();
  const [{ lots, costsShown }, base, nibStock] = await Promise.all([
    listLotsForViewer({ viewer }),
    getWorkspaceBaseCurrency({ workspaceId: viewer.workspace.id }),
    getNibStock({ workspaceId: viewer.workspace.id }),
  ]);
  return (
    <div className="space-y-6">
      <div className="flex flex-wrap items-end justify-between gap-4">
        <div>
          <h1 className="text-3xl font-bold">Bean lots</h1>
          <p className="mt-2 max-w-2xl text-cocoa-700">
            Every sack of beans from arrival to nibs: what was lost at sorting, roasting and winnowing
            {costsShown ? ", and what a kilo of nibs really cost" : ""}.
          </p>
        </div>
        <div className="flex gap-2">
          <Button asChild variant="secondary">
            <Link href="/lots/roast-presets">Roast presets</Link>
          </Button>
          {can(viewer.role, "lots.edit") ? (
            <Button asChild>
              <Link href="/lots/new">Record a lot</Link>
            </Button>
          ) : null}
        </div>
      </div>
      {lots.length === 0 ? (
        <p className="text-cocoa-500">No lot yet.</p>
      ) : (
        <Table>
          <thead>
            <tr>
              <Th>Lot</Th>
              <Th>Origin</Th>
              <Th>Supplier</Th>
              <Th>Arrived</Th>
              <Th numeric>Received</Th>
              <Th numeric>Nibs</Th>
              <Th numeric>Nibs in stock</Th>
              <Th numeric>Nib yield</Th>
              {costsShown ? <Th numeric>Nib cost per kg</Th> : null}
            </tr>
          </thead>
          <tbody>
            {lots.map((l) => (
              <tr key={l.id} data-testid={`lot-${l.code}`}>
                <Td className="whitespace-nowrap">
                  <Link href={`/lots/${l.id}`} className="font-semibold text-pod-dark underline-offset-2 hover:underline">
                    {l.code}
                  </Link>
                </Td>
                <Td>
                  {l.originCountry}
                  {l.producer ? <span className="block text-xs text-cocoa-500">{l.producer}</span> : null}
                </Td>
                <Td>{l.supplierName ?? "—"}</Td>
                <Td className="whitespace-nowrap">{formatDate(l.arrivedOn)}</Td>
                <Td numeric>{formatKg(l.massReceivedKg, 1)}</Td>
                <Td numeric>{formatKg(l.chain.nibMassKg, 1)}</Td>
                <Td numeric>{nibStock.get(l.id)?.winnowed ? formatKg(nibStock.get(l.id)!.inStockKg, 1) : "—"}</Td>
                <Td numeric>
                  {formatPercent(l.chain.cumulativeYieldPercent)}
                  {l.chain.nibMassEstimated ? <Badge className="ml-2">estimate</Badge> : null}
                </Td>
                {l.nibCost ? (
                  <Td numeric>{l.nibCost.perKg ? formatMoney(l.nibCost.perKg, base) : <span className="text-brick">{l.nibCost.problem}</span>}</Td>
                ) : null}
              </tr>
            ))}
          </tbody>
        </Table>
      )}
    </div>
  );
}
