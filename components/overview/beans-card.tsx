import Link from "next/link";
import { Badge } from "@/components/ui/badge";
import { Card, CardHeader } from "@/components/ui/card";
import type { BeansOnHand } from "@/lib/data/overview";
import { formatKg } from "@/lib/format";
import { FewFooter } from "./few-footer";

/** Nibs in stock over all lots, and the lots still holding nibs or unwinnowed beans. */
export function BeansCard({ beans }: { beans: BeansOnHand }) {
  return (
    <Card data-testid="overview-beans">
      <CardHeader title="Beans and nibs" description="Nibs out of winnowing less what completed runs took; beans not winnowed yet count as beans, not nibs." />
      <p className="text-sm">
        Nibs in stock: <span className="figures text-xl font-bold" data-testid="nibs-in-stock">{formatKg(beans.nibsInStockKg, 1)}</span>
      </p>
      {beans.lots.rows.length === 0 ? (
        <p className="mt-3 text-sm text-cocoa-500">No lot holds beans or nibs.</p>
      ) : (
        <ul className="mt-3 divide-y divide-sand-light text-sm">
          {beans.lots.rows.map((l) => (
            <li key={l.id} className="flex flex-wrap items-baseline justify-between gap-x-3 gap-y-1 py-2" data-testid={`lot-on-hand-${l.code}`}>
              <span>
                <Link href={`/lots/${l.id}`} className="font-semibold text-pod-dark hover:underline">
                  {l.code}
                </Link>{" "}
                {l.originCountry}
              </span>
              <span className="figures flex items-center gap-2 whitespace-nowrap">
                {l.winnowed ? (
                  <>{formatKg(l.nibsInStockKg, 1)} of nibs</>
                ) : (
                  <>
                    {formatKg(l.massReceivedKg, 1)} of beans <Badge tone="accent">not winnowed</Badge>
                  </>
                )}
              </span>
            </li>
          ))}
        </ul>
      )}
      <FewFooter shown={beans.lots.rows.length} total={beans.lots.total} href="/lots" where="Bean lots" />
    </Card>
  );
}
