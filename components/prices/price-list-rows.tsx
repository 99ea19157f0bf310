"use client";

import { useState } from "react";
import { perKg, quotedPrice } from "@/components/data/money";
import { Badge } from "@/components/ui/badge";
import { Table, Td, Th } from "@/components/ui/table";
import type { RowResult, RowStatus } from "@/lib/price-lists/check";
import { formatDate, formatPercent } from "@/lib/format";

const STATUS: Record<RowStatus, { label: string; tone: "meets" | "short" | "neutral" }> = {
  new: { label: "will import", tone: "meets" },
  already_imported: { label: "already recorded", tone: "neutral" },
  duplicate_in_file: { label: "repeated row", tone: "neutral" },
  invalid: { label: "refused", tone: "short" },
};

/** Every row of the file with its verdict, reasons, and the change from the supplier's current price. */
export function PriceListRows({ rows, baseCurrency }: { rows: RowResult[]; baseCurrency: string }) {
  const [problemsOnly, setProblemsOnly] = useState(false);
  const shown = problemsOnly ? rows.filter((r) => r.status === "invalid") : rows;
  return (
    <div className="space-y-3">
      <label className="flex items-center gap-2 text-sm text-cocoa-700">
        <input type="checkbox" className="size-4 accent-pod" checked={problemsOnly} onChange={(e) => setProblemsOnly(e.target.checked)} />
        Show refused rows only
      </label>
      <Table data-testid="price-list-rows">
        <thead>
          <tr>
            <Th numeric>Row</Th>
            <Th>Verdict</Th>
            <Th>Ingredient</Th>
            <Th>Quoted</Th>
            <Th>Valid from</Th>
            <Th numeric>Per kg ({baseCurrency})</Th>
            <Th numeric>Now</Th>
            <Th numeric>Change</Th>
          </tr>
        </thead>
        <tbody>
          {shown.map((r) => (
            <tr key={r.rowNumber} data-testid={`row-${r.rowNumber}`} className={r.status === "invalid" ? "bg-brick-light/40" : undefined}>
              <Td numeric>{r.rowNumber}</Td>
              <Td>
                <Badge tone={STATUS[r.status].tone}>{STATUS[r.status].label}</Badge>
                {r.reasons.map((reason) => (
                  <p key={reason} className={r.status === "invalid" ? "mt-1 text-xs text-brick" : "mt-1 text-xs text-cocoa-500"}>
                    {reason}
                  </p>
                ))}
              </Td>
              <Td>{r.ingredientName || <span className="text-cocoa-300">—</span>}</Td>
              <Td>{r.quote ? quotedPrice(r.quote) : "—"}</Td>
              <Td>{r.quote ? formatDate(r.quote.validFrom) : "—"}</Td>
              <Td numeric>{perKg(r.perKgBase, baseCurrency)}</Td>
              <Td numeric>{perKg(r.previousPerKgBase, baseCurrency)}</Td>
              <Td numeric className={r.changePercent?.startsWith("-") ? "text-sage" : r.changePercent && r.changePercent !== "0" ? "text-brick" : undefined}>
                {r.changePercent === null ? "—" : `${r.changePercent.startsWith("-") ? "" : "+"}${formatPercent(r.changePercent)}`}
              </Td>
            </tr>
          ))}
        </tbody>
      </Table>
    </div>
  );
}
