import Link from "next/link";
import { Badge } from "@/components/ui/badge";
import { Card, CardHeader } from "@/components/ui/card";
import { Table, Td, Th } from "@/components/ui/table";
import type { Few, QuoteToCheck } from "@/lib/data/overview";
import { formatDate } from "@/lib/format";

/** Every current quote to ask for again (up to the list's limit), on the Prices page. */
export function QuotesToCheck({ quotes }: { quotes: Few<QuoteToCheck> }) {
  if (quotes.total === 0) return null;
  return (
    <Card id="to-check" data-testid="prices-to-check">
      <CardHeader
        title={`Prices to check (${quotes.total})`}
        description="Current quotes that end within 30 days with no newer quote entered, and quotes in effect for more than six months. Ask the supplier, then record the new quote on the ingredient's page or upload their list."
      />
      <Table>
        <thead>
          <tr>
            <Th>Ingredient</Th>
            <Th>Supplier</Th>
            <Th>Valid from</Th>
            <Th>Until</Th>
            <Th>Why</Th>
          </tr>
        </thead>
        <tbody>
          {quotes.rows.map((q) => (
            <tr key={q.id}>
              <Td>
                <Link href={`/ingredients/${q.ingredientId}`} className="font-semibold text-pod-dark hover:underline">
                  {q.ingredientName}
                </Link>
              </Td>
              <Td>
                <Link href={`/suppliers/${q.supplierId}`} className="hover:underline">
                  {q.supplierName}
                </Link>
              </Td>
              <Td className="whitespace-nowrap">{formatDate(q.validFrom)}</Td>
              <Td className="whitespace-nowrap">{q.validUntil ? formatDate(q.validUntil) : "open"}</Td>
              <Td>{q.reason === "ends" ? <Badge tone="short">ends soon</Badge> : <Badge tone="neutral">over six months old</Badge>}</Td>
            </tr>
          ))}
        </tbody>
      </Table>
      {quotes.total > quotes.rows.length ? <p className="mt-3 text-sm text-cocoa-500">The first {quotes.rows.length} are shown.</p> : null}
    </Card>
  );
}
