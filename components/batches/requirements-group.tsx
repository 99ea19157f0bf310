import { Badge } from "@/components/ui/badge";
import { Card, CardHeader } from "@/components/ui/card";
import { Table, Td, Th } from "@/components/ui/table";
import type { VisibleSupplierGroup } from "@/lib/cost-visibility/purchasing";
import { formatKg, formatMoney } from "@/lib/format";
import { DraftOrderButton } from "./draft-order-button";

const UNIT = { per_kg: "per kg", per_pack: "per pack", per_tonne: "per t" } as const;

/** One supplier's part of the material requirements, with the order it would take (its prices only for those who may see costs). */
export function RequirementsGroup({ group, batchIds, canBuy, showPrices }: { group: VisibleSupplierGroup; batchIds: string[]; canBuy: boolean; showPrices: boolean }) {
  const toOrder = group.lines.some((l) => Number(l.order.quantityKg) > 0);
  return (
    <Card data-testid={`requirements-${group.supplierName ?? "no-supplier"}`}>
      <CardHeader
        title={group.supplierName ?? "No preferred supplier"}
        description={group.supplierId ? (group.supplierEmail ?? "No e-mail address: add one before sending an order.") : "Choose a preferred supplier on each ingredient's page to order these."}
        action={canBuy && group.supplierId && toOrder ? <DraftOrderButton supplierId={group.supplierId} supplierName={group.supplierName!} batchIds={batchIds} /> : null}
      />
      <Table>
        <thead>
          <tr>
            <Th>Ingredient</Th>
            <Th numeric>Needed</Th>
            <Th numeric>On hand</Th>
            <Th numeric>On order</Th>
            <Th numeric>Short</Th>
            <Th numeric>To order</Th>
            {showPrices ? <Th numeric>Quote</Th> : null}
            {showPrices ? <Th numeric>Amount</Th> : null}
          </tr>
        </thead>
        <tbody>
          {group.lines.map((l) => (
            <tr key={l.ingredientId}>
              <Td>
                {l.ingredientName}
                {l.fromLots ? <span className="block text-xs text-cocoa-500">on hand includes the bean lots&apos; nibs</span> : null}
              </Td>
              <Td numeric>{formatKg(l.neededKg, 3)}</Td>
              <Td numeric>{formatKg(l.onHandKg, 3)}</Td>
              <Td numeric>{formatKg(l.onOrderKg, 3)}</Td>
              <Td numeric>{Number(l.shortKg) > 0 ? <Badge tone="short">{formatKg(l.shortKg, 3)}</Badge> : <Badge tone="meets">covered</Badge>}</Td>
              <Td numeric>
                {formatKg(l.order.quantityKg, 3)}
                {l.order.packs ? <span className="block text-xs text-cocoa-500">{l.order.packs} × {formatKg(l.quote?.packKg, 0)}</span> : null}
              </Td>
              {showPrices ? <Td numeric>{l.quote?.price ? `${formatMoney(l.quote.price, l.quote.currency)} ${UNIT[l.quote.unit]}` : "—"}</Td> : null}
              {showPrices ? <Td numeric>{l.amount && l.quote ? formatMoney(l.amount, l.quote.currency) : "—"}</Td> : null}
            </tr>
          ))}
        </tbody>
      </Table>
    </Card>
  );
}
