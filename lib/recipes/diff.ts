import Decimal from "decimal.js";
import type { CompositionFigures } from "@/lib/formulation";
import type { VersionLine } from "./types";

/** What two versions are compared on. */
export type Comparable = {
  lines: ReadonlyArray<Pick<VersionLine, "ingredientId" | "name" | "percent">>;
  composition: CompositionFigures;
  costPerKg: string | null;
  costPerBar: string | null;
};

export type DiffRow = { key: string; label: string; a: string | null; b: string | null; delta: string | null; changed: boolean };

/** b − a when both exist, else null. */
export function deltaOf(a: string | null | undefined, b: string | null | undefined): string | null {
  if (a === null || a === undefined || b === null || b === undefined) return null;
  return new Decimal(b).minus(new Decimal(a)).toFixed();
}

function row(key: string, label: string, a: string | null, b: string | null): DiffRow {
  const delta = deltaOf(a, b);
  return { key, label, a, b, delta, changed: a === null || b === null ? a !== b : !new Decimal(delta!).isZero() };
}

/** Lines matched by ingredient: in a's order, then lines only b has. */
export function diffLines(a: Comparable["lines"], b: Comparable["lines"]): DiffRow[] {
  const inB = new Map(b.map((l) => [l.ingredientId, l]));
  const rows = a.map((l) => row(l.ingredientId, l.name, l.percent, inB.get(l.ingredientId)?.percent ?? null));
  const inA = new Set(a.map((l) => l.ingredientId));
  for (const l of b) if (!inA.has(l.ingredientId)) rows.push(row(l.ingredientId, l.name, null, l.percent));
  return rows;
}

/** The composition figures the bench shows, in its order. */
export const COMPARED_QUANTITIES = [
  ["totalDryCocoaSolids", "Total dry cocoa solids"],
  ["cocoaButter", "Cocoa butter"],
  ["cocoaSolidsNonFat", "Fat-free cocoa solids"],
  ["dryMilkSolids", "Milk solids"],
  ["milkFat", "Milk fat"],
  ["totalFat", "Total fat"],
  ["sugar", "Sugar"],
  ["inclusions", "Inclusions"],
  ["cocoaSolidsStatement", "Label cocoa %"],
] as const satisfies ReadonlyArray<readonly [keyof CompositionFigures, string]>;

export function diffComposition(a: CompositionFigures, b: CompositionFigures): DiffRow[] {
  return COMPARED_QUANTITIES.map(([key, label]) => row(key, label, a[key], b[key]));
}

export function diffCost(a: Comparable, b: Comparable): DiffRow[] {
  return [row("costPerKg", "Ingredient cost per kg", a.costPerKg, b.costPerKg), row("costPerBar", "Ingredient cost per bar", a.costPerBar, b.costPerBar)];
}
