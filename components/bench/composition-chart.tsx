import { memo } from "react";
import type { CompositionFigures } from "@/lib/formulation";
import { pct } from "@/lib/recipes/format";

/** The mix's parts in display order, with our colours (display only). */
const MIX_PARTS = [
  { key: "cocoaButter", label: "Cocoa butter", colour: "#C9A27E" },
  { key: "cocoaSolidsNonFat", label: "Fat-free cocoa solids", colour: "#4A3328" },
  { key: "milkFat", label: "Milk fat", colour: "#EAD7B0" },
  { key: "milkSolidsNonFat", label: "Non-fat milk solids", colour: "#B8A68A" },
  { key: "sugar", label: "Sugar", colour: "#C4711F" },
  { key: "vegetableFat", label: "Other fats", colour: "#8AA27F" },
  { key: "moisture", label: "Moisture", colour: "#9DB7C4" },
  { key: "other", label: "Other", colour: "#A8968A" },
  { key: "inclusions", label: "Inclusions", colour: "#7A5A3A" },
] as const satisfies ReadonlyArray<{ key: keyof CompositionFigures; label: string; colour: string }>;

/**
 * One bar per part of the finished product (parts at 0 are left out), on a
 * 0–100 % track. Plain elements sized in percent: drawn with the page's HTML
 * (nothing to load or measure, no layout shift) and cheap to redraw on every
 * slider move. Every figure shown as text comes from the engine's strings.
 */
export const CompositionChart = memo(function CompositionChart({ composition }: { composition: CompositionFigures }) {
  // Numbers only for drawing lengths.
  const rows = MIX_PARTS.map((p) => ({ ...p, value: Number(composition[p.key]) })).filter((r) => r.value > 0);
  const summary = rows.map((r) => `${r.label} ${pct(composition[r.key])}`).join(", ");
  return (
    <div role="img" aria-label={`The mix: ${summary}`} className="grid w-full grid-cols-[8rem_minmax(0,1fr)] items-center gap-x-2 gap-y-1" data-testid="composition-chart">
      {rows.map((r) => (
        <div key={r.key} className="contents">
          <span className="truncate text-right text-xs text-cocoa-500">{r.label}</span>
          <span className="block h-[18px] rounded-[3px] bg-cream-deep">
            <span className="block h-full rounded-[3px]" style={{ width: `${Math.min(100, r.value)}%`, backgroundColor: r.colour }} />
          </span>
        </div>
      ))}
    </div>
  );
});
