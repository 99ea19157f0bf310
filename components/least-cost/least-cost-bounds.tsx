"use client";

import { Table, Td, Th } from "@/components/ui/table";
import type { IngredientSpec } from "@/lib/formulation";
import type { LeastCostSettings } from "./least-cost-problem";

// The panel sits in the bench's narrow side column: tight cells, the unit in the headings and
// names that wrap. The current percents are on the bench's own lines beside it.
const tight = "px-2";
const heading = "whitespace-nowrap px-2";
const cell = "figures w-14 rounded border border-sand bg-white px-1.5 py-1 text-right text-sm";

/** Per-line minimum and maximum; locked lines stay where the bench has them. */
export function LeastCostBounds({
  ingredients,
  locked,
  bounds,
  onChange,
}: {
  ingredients: readonly IngredientSpec[];
  locked: readonly boolean[];
  bounds: LeastCostSettings["bounds"];
  onChange: (next: LeastCostSettings["bounds"]) => void;
}) {
  const set = (i: number, side: "min" | "max", value: string) => onChange(bounds.map((b, k) => (k === i ? { ...b, [side]: value } : b)));
  return (
    <Table data-testid="least-cost-bounds">
      <thead>
        <tr>
          <Th className={tight}>Line</Th>
          <Th numeric className={heading}>
            Min %
          </Th>
          <Th numeric className={heading}>
            Max %
          </Th>
        </tr>
      </thead>
      <tbody>
        {ingredients.map((ingredient, i) => (
          <tr key={i}>
            <Td className={`${tight} break-words`}>{ingredient.name}</Td>
            {locked[i] ? (
              <Td numeric colSpan={2} className={`${tight} text-cocoa-500`}>
                locked
              </Td>
            ) : (
              <>
                <Td numeric className={tight}>
                  <input aria-label={`Minimum for ${ingredient.name}`} inputMode="decimal" autoComplete="off" className={cell} value={bounds[i]?.min ?? ""} onChange={(e) => set(i, "min", e.target.value)} />
                </Td>
                <Td numeric className={tight}>
                  <input aria-label={`Maximum for ${ingredient.name}`} inputMode="decimal" autoComplete="off" className={cell} value={bounds[i]?.max ?? ""} onChange={(e) => set(i, "max", e.target.value)} />
                </Td>
              </>
            )}
          </tr>
        ))}
      </tbody>
    </Table>
  );
}
