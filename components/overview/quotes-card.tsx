import Link from "next/link";
import { Badge } from "@/components/ui/badge";
import { Card, CardHeader } from "@/components/ui/card";
import type { Few, QuoteToCheck } from "@/lib/data/overview";
import { formatDate } from "@/lib/format";
import { FewFooter } from "./few-footer";

/** Supplier prices to ask for again: ending within 30 days with nothing after them, or over six months old. */
export function QuotesCard({ quotes }: { quotes: Few<QuoteToCheck> }) {
  return (
    <Card data-testid="overview-quotes">
      <CardHeader
        title="Prices to check"
        description="Current quotes that end within 30 days with no newer quote entered, and quotes in effect for more than six months."
      />
      {quotes.rows.length === 0 ? (
        <p className="text-sm text-cocoa-500">No current quote needs checking.</p>
      ) : (
        <ul className="divide-y divide-sand-light text-sm">
          {quotes.rows.map((q) => (
            <li key={q.id} className="flex flex-wrap items-baseline justify-between gap-x-3 gap-y-1 py-2" data-testid={`quote-to-check-${q.id}`}>
              <span>
                <Link href={`/ingredients/${q.ingredientId}`} className="font-semibold text-pod-dark hover:underline">
                  {q.ingredientName}
                </Link>{" "}
                <span className="text-cocoa-700">from {q.supplierName}</span>
              </span>
              <span className="flex items-center gap-2 whitespace-nowrap">
                {q.reason === "ends" ? (
                  <Badge tone="short">ends {formatDate(q.validUntil)}</Badge>
                ) : (
                  <Badge tone="neutral">since {formatDate(q.validFrom)}</Badge>
                )}
              </span>
            </li>
          ))}
        </ul>
      )}
      <FewFooter shown={quotes.rows.length} total={quotes.total} href="/prices#to-check" where="Prices" />
    </Card>
  );
}
