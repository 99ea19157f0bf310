"use client";

import dynamic from "next/dynamic";
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

const ROW_HEIGHT = 22;

// Recharts is the largest script of the bench: it loads after the first paint, into a box
// already at its final height (no layout shift); the figures beside it never wait for it.
const CompositionBars = dynamic(() => import("./composition-bars"), { ssr: false });

/**
 * One bar per part of the finished product (parts at 0 are left out), drawn by
 * composition-bars.tsx. Every figure shown as text comes from the engine's strings.
 */
export const CompositionChart = memo(function CompositionChart({ composition }: { composition: CompositionFigures }) {
  // Numbers only for drawing lengths.
  const rows = MIX_PARTS.map((p) => ({ ...p, value: Number(composition[p.key]) })).filter((r) => r.value > 0);
  const summary = rows.map((r) => `${r.label} ${pct(composition[r.key])}`).join(", ");
  return (
    <div role="img" aria-label={`The mix: ${summary}`} style={{ height: rows.length * ROW_HEIGHT + 4 }} className="w-full">
      <CompositionBars rows={rows} />
    </div>
  );
});
