"use client";

import { Button } from "@/components/ui/button";
import type { ImportOutcome } from "@/lib/data/price-list-imports";
import type { PriceListCheck } from "@/lib/price-lists/check";
import { PriceListRows } from "./price-list-rows";
import { QuotesTable } from "./quotes-table";

/** Steps 2 and 3 of a price-list upload: every row's verdict, the import, and the supplier's quotes after it. */
export function PriceListVerdicts({
  check,
  outcome,
  pending,
  onImport,
}: {
  check: PriceListCheck;
  outcome: ImportOutcome | null;
  pending: boolean;
  onImport: () => void;
}) {
  const n = check.counts.new;
  return (
    <>
      <section className="space-y-4">
        <h2 className="text-lg font-bold">2. Check every row</h2>
        <p className="text-sm" data-testid="price-list-counts">
          <strong>{n}</strong> new quotes to import · {check.counts.already_imported} already recorded · {check.counts.duplicate_in_file} repeated in the file ·{" "}
          <span className={check.counts.invalid ? "font-semibold text-brick" : undefined}>{check.counts.invalid} refused</span>
        </p>
        <PriceListRows rows={check.rows} baseCurrency={check.baseCurrency} />
      </section>

      <section className="space-y-4">
        <h2 className="text-lg font-bold">3. Import</h2>
        {outcome ? (
          <p role="status" data-testid="price-list-outcome" className="rounded-lg bg-sage-light px-3 py-2 text-sm text-sage">
            Imported {outcome.imported} quote{outcome.imported === 1 ? "" : "s"} from {check.supplier.name}. {outcome.duplicates} already recorded,{" "}
            {outcome.invalid} refused.
          </p>
        ) : (
          <div className="flex flex-wrap items-center gap-4">
            <Button onClick={onImport} disabled={pending || n === 0}>
              {pending ? "Importing…" : `Import ${n} new quote${n === 1 ? "" : "s"}`}
            </Button>
            <span className="text-sm text-cocoa-500">All of them in one go, or none. Refused rows are skipped; fix them and upload again later.</span>
          </div>
        )}
      </section>

      {outcome ? (
        <section className="space-y-4">
          <h2 className="text-lg font-bold">{check.supplier.name}: quotes now</h2>
          <QuotesTable filter={{ supplierId: check.supplier.id }} hide={["supplier"]} />
        </section>
      ) : null}
    </>
  );
}
