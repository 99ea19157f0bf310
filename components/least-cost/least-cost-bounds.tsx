"use client";

import type { RecipeLine } from "@/lib/formulation";
import { Table, Td, Th } from "@/components/ui/table";
import { pct } from "@/lib/recipes/format";
import type { LeastCostSettings } from "./least-cost-problem";

const cell = "figures w-20 rounded border border-sand bg-white px-2 py-1 text-right text-sm";

/** Per-line minimum and maximum; locked lines stay where the bench has them. */
export function LeastCostBounds({
  lines,
  locked,
  bounds,
  onChange,
}: {
  lines: readonly RecipeLine[];
  locked: readonly boolean[];
  bounds: LeastCostSettings["bounds"];
  onChange: (next: LeastCostSettings["bounds"]) => void;
}) {
  const set = (i: number, side: "min" | "max", value: string) => onChange(bounds.map((b, k) => (k === i ? { ...b, [side]: value } : b)));
  return (
    <Table>
      <thead>
        <tr>
          <Th>Line</Th>
          <Th numeric>Now</Th>
          <Th numeric>Min %</Th>
          <Th numeric>Max %</Th>
        </tr>
      </thead>
      <tbody>
        {lines.map((line, i) => (
          <tr key={i}>
            <Td>{line.ingredient.name}</Td>
            <Td numeric>{pct(String(line.percent), 2)}</Td>
            {locked[i] ? (
              <Td numeric colSpan={2} className="text-cocoa-500">
                locked
              </Td>
            ) : (
              <>
                <Td numeric>
                  <input aria-label={`Minimum for ${line.ingredient.name}`} inputMode="decimal" className={cell} value={bounds[i]?.min ?? ""} onChange={(e) => set(i, "min", e.target.value)} />
                </Td>
                <Td numeric>
                  <input aria-label={`Maximum for ${line.ingredient.name}`} inputMode="decimal" className={cell} value={bounds[i]?.max ?? ""} onChange={(e) => set(i, "max", e.target.value)} />
                </Td>
              </>
            )}
          </tr>
        ))}
      </tbody>
    </Table>
  );
}
