"use client";

import { useCallback, type Dispatch } from "react";
import type { BenchIngredient, DraftLine } from "@/lib/recipes/types";
import { pct } from "@/lib/recipes/format";
import { totalPercent, type BenchAction } from "./bench-state";
import { SliderRow } from "./slider-row";

/** The bench's lines with their total; every change is dispatched to the bench reducer. */
export function LineList({
  lines,
  library,
  readOnly,
  message,
  dispatch,
}: {
  lines: DraftLine[];
  library: ReadonlyMap<string, BenchIngredient>;
  readOnly?: boolean;
  message: string | null;
  dispatch: Dispatch<BenchAction>;
}) {
  const onPercent = useCallback((index: number, value: string) => dispatch({ type: "set-percent", index, value }), [dispatch]);
  const onToggleLock = useCallback((index: number) => dispatch({ type: "toggle-lock", index }), [dispatch]);
  const onRemove = useCallback((index: number) => dispatch({ type: "remove-line", index }), [dispatch]);
  const total = totalPercent(lines);
  return (
    <div>
      {lines.length === 0 ? (
        <p className="rounded-lg bg-cream-deep p-4 text-sm text-cocoa-700">No lines yet. Add the first ingredient below: it starts at 100 %.</p>
      ) : (
        <ul className="divide-y divide-sand-light">
          {lines.map((line, index) => {
            const ingredient = library.get(line.ingredientId);
            return (
              <SliderRow
                key={line.ingredientId}
                index={index}
                name={ingredient?.name ?? "Unknown ingredient"}
                note={ingredient?.archived ? "archived in the library" : ingredient?.isInclusion ? "inclusion" : undefined}
                percent={line.percent}
                locked={line.locked}
                readOnly={readOnly}
                onPercent={onPercent}
                onToggleLock={onToggleLock}
                onRemove={onRemove}
              />
            );
          })}
        </ul>
      )}
      <div className="mt-2 flex items-center justify-between border-t border-sand pt-2 text-sm">
        <p role="status" aria-live="polite" className="text-cocoa-700" data-testid="bench-message">
          {message}
        </p>
        <p className="font-semibold">
          Total <span className="figures ml-2" data-testid="lines-total">{pct(total)}</span>
        </p>
      </div>
    </div>
  );
}
