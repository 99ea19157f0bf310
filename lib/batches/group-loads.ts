/**
 * Big batches are many loads of a few compositions (100 t on a 60 kg refiner:
 * 1,667 loads, 7 different ones). Above a page count a sheet groups identical
 * loads: one page per composition, listing the loads it applies to.
 */
import type { SheetLoad } from "./sheet";

/** Up to this many loads, the sheet prints one page per load. */
export const PAGE_PER_LOAD_LIMIT = 24;

export type LoadGroup = { loadNos: number[]; label: string; load: SheetLoad };

/** "1–3, 5, 7–9" from ascending load numbers. */
export function rangeLabel(numbers: readonly number[]): string {
  const parts: string[] = [];
  let start = numbers[0];
  for (let i = 0; i < numbers.length; i++) {
    const n = numbers[i]!;
    const next = numbers[i + 1];
    if (next === n + 1) continue;
    parts.push(start === n ? `${n}` : `${start}–${n}`);
    start = next;
  }
  return parts.join(", ");
}

/** Loads grouped by identical line masses, in order of their first load. */
export function groupLoads(loads: readonly SheetLoad[]): LoadGroup[] {
  const groups = new Map<string, { loadNos: number[]; load: SheetLoad }>();
  for (const load of loads) {
    const key = load.lines.map((l) => l.massGrams).join("/");
    const g = groups.get(key) ?? { loadNos: [], load };
    g.loadNos.push(load.loadNo);
    groups.set(key, g);
  }
  return [...groups.values()].map((g) => ({ ...g, label: rangeLabel(g.loadNos) }));
}
