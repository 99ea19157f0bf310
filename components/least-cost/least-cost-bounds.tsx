"use client";

import { Table, Td, Th } from "@/components/ui/table";
import { formatPercent, type RecipeLine } from "@/lib/formulation";
import type { LeastCostSettings } from "./least-cost-problem";

// The panel sits in the bench's narrow side column: tight cells, figures without the unit
// (the headings carry "%"), and names that wrap, so four columns fit in about 300 px.
const tight = "px-2";
const heading = "whitespace-nowrap px-2";
const cell = "figures w-14 rounded border border-sand bg-white px-1.5 py-1 text-right text-sm";

/** Per-line minimum and maximum; locked lines stay where the bench has them. */
export function LeastCostBounds({
  lines,
  locked,
  bounds,
  decimals,
  onChange,
}: {
  lines: readonly RecipeLine[];
  locked: readonly boolean[];
  bounds: LeastCostSettings["bounds"];
  /** Decimals of the bench's grid step, for the current percents. */
  decimals: number;
  onChange: (next: LeastCostSettings["bounds"]) => void;
}) {
  const set = (i: number, side: "min" | "max", value: string) => onChange(bounds.map((b, k) => (k === i ? { ...b, [side]: value } : b)));
  return (
    <Table data-testid="least-cost-bounds">
      <thead>
        <tr>
          <Th className={tight}>Line</Th>
          <Th numeric className={heading}>
            Now %
          </Th>
          <Th numeric className={heading}>
            Min %
          </Th>
          <Th numeric className={heading}>
            Max %
          </Th>
        </tr>
      </thead>
      <tbody>
        {lines.map((line, i) => (
          <tr key={i}>
            <Td className={`${tight} break-words`}>{line.ingredient.name}</Td>
            <Td numeric className={tight}>
              {formatPercent(String(line.percent), decimals) ?? "—"}
            </Td>
            {locked[i] ? (
              <Td numeric colSpan={2} className={`${tight} text-cocoa-500`}>
                locked
              </Td>
            ) : (
              <>
                <Td numeric className={tight}>
                  <input aria-label={`Minimum for ${line.ingredient.name}`} inputMode="decimal" autoComplete="off" className={cell} value={bounds[i]?.min ?? ""} onChange={(e) => set(i, "min", e.target.value)} />
                </Td>
                <Td numeric className={tight}>
                  <input aria-label={`Maximum for ${line.ingredient.name}`} inputMode="decimal" autoComplete="off" className={cell} value={bounds[i]?.max ?? ""} onChange={(e) => set(i, "max", e.target.value)} />
                </Td>
              </>
            )}
          </tr>
        ))}
      </tbody>
    </Table>
  );
}
