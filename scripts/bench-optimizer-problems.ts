/**
 * The least-cost cases the optimizer benchmark times (invented demo prices per kg), stated as a
 * formulator sets them in the bench's panel: the lines with today's price, per-line bounds and
 * locks, the cocoa target, and every standards category of the chocolate type ticked. Node solves
 * `problemOf(c)` (the panel's own toProblem); chromium gets the same case as a saved recipe and
 * the same clicks in the panel (scripts/bench-optimizer-browser.ts), so both time the same work.
 */
import { categoriesFor, categoryKey, toProblem } from "../components/least-cost/least-cost-problem";
import type { IngredientSpec, LeastCostProblem } from "../lib/formulation";

export type BenchLine = { spec: IngredientSpec; percent: string; min?: string; max?: string; locked?: boolean };
export type BenchCase = { label: string; recipe: string; type: "dark" | "milk"; lines: BenchLine[]; targetMode: "exactly" | "atLeast"; target: string };

/** The bench's grid step (components/bench/bench-state.ts RESOLUTION). */
export const BENCH_RESOLUTION = "0.1";

const spec = (name: string, pricePerKg: string, fields: Omit<IngredientSpec, "name" | "pricePerKg">): IngredientSpec => ({ name, pricePerKg, ...fields });
const line = (s: IngredientSpec, percent: string, extra: Omit<BenchLine, "spec" | "percent"> = {}): BenchLine => ({ spec: s, percent, ...extra });

// Compositions: REFERENCE.md §3 (USDA FDC 167568, 171421, 169655, 173454, 170877) and common
// practice for nibs (butter ≈ 55 %, moisture ≈ 2 %); origins vary the fat a little. The names
// differ from the demo library's so the benchmark can add them beside it.
const NIBS_A = spec("Cocoa nibs, Ecuador", "9.40", { cocoaButter: "55", cocoaSolidsNonFat: "43", moisture: "2" });
const NIBS_B = spec("Cocoa nibs, Ghana", "8.60", { cocoaButter: "53.5", cocoaSolidsNonFat: "44.3", moisture: "2.2" });
const NIBS_C = spec("Cocoa nibs, Madagascar", "11.20", { cocoaButter: "56.2", cocoaSolidsNonFat: "42", moisture: "1.8" });
const LIQUOR_A = spec("Cocoa liquor, Ghana", "10.10", { cocoaButter: "52.31", cocoaSolidsNonFat: "46.35", moisture: "1.34" });
const LIQUOR_B = spec("Cocoa liquor, Peru", "10.80", { cocoaButter: "54", cocoaSolidsNonFat: "44.5", moisture: "1.5" });
const BUTTER_A = spec("Cocoa butter, natural", "15.80", { cocoaButter: "100" });
const BUTTER_B = spec("Cocoa butter, deodorised", "14.90", { cocoaButter: "100" });
const POWDER_A = spec("Cocoa powder 10–12 %", "5.90", { cocoaButter: "11", cocoaSolidsNonFat: "86", moisture: "3" });
const POWDER_B = spec("Cocoa powder 20–22 %", "6.70", { cocoaButter: "21", cocoaSolidsNonFat: "76", moisture: "3" });
const SUGAR_A = spec("Cane sugar", "1.15", { sugar: "99.98", moisture: "0.02" });
const SUGAR_B = spec("Beet sugar", "0.98", { sugar: "99.95", moisture: "0.05" });
const SUGAR_C = spec("Coconut sugar", "6.50", { sugar: "94", moisture: "2" });
const WMP_A = spec("Whole milk powder, 26 % fat", "4.90", { milkFat: "26.71", milkSolidsNonFat: "70.82", moisture: "2.47" });
const WMP_B = spec("Whole milk powder, high fat", "5.40", { milkFat: "28.5", milkSolidsNonFat: "69", moisture: "2.5" });
const SMP_A = spec("Skim milk powder, medium heat", "3.70", { milkFat: "0.77", milkSolidsNonFat: "96.07", moisture: "3.16" });
const SMP_B = spec("Skim milk powder, low heat", "3.95", { milkFat: "1", milkSolidsNonFat: "95.5", moisture: "3.5" });
const BUTTERMILK = spec("Buttermilk powder, sweet", "3.30", { milkFat: "5.8", milkSolidsNonFat: "91.2", moisture: "3" });
const MILK_FAT = spec("Anhydrous milk fat", "8.20", { milkFat: "99.8", moisture: "0.1" });
const LECITHIN = spec("Lecithin, liquid", "6.20", {});
const VANILLA = spec("Vanilla powder", "620", {});

/** A 70 % dark from 8 lines: cocoa exactly 70 %, ≥ 8 % added butter, lecithin 0.2–0.5 %. */
export const DARK_8: BenchCase = {
  label: "8 lines (dark)",
  recipe: "Optimizer bench dark, 8 lines",
  type: "dark",
  lines: [
    line(NIBS_A, "40"), line(NIBS_B, "15"), line(LIQUOR_A, "6"), line(BUTTER_A, "9", { min: "8" }),
    line(POWDER_A, "0"), line(SUGAR_A, "29.6"), line(LECITHIN, "0.4", { min: "0.2", max: "0.5" }), line(VANILLA, "0", { max: "0.1" }),
  ],
  targetMode: "exactly",
  target: "70",
};

/** A 40 % milk from 20 lines: cocoa at least 40 %, several caps, the lecithin line locked. */
export const MILK_20: BenchCase = {
  label: "20 lines (milk)",
  recipe: "Optimizer bench milk, 20 lines",
  type: "milk",
  lines: [
    line(NIBS_A, "12"), line(NIBS_B, "8"), line(NIBS_C, "4", { max: "10" }), line(LIQUOR_A, "4"), line(LIQUOR_B, "0"),
    line(BUTTER_A, "10"), line(BUTTER_B, "6"), line(POWDER_A, "0", { max: "3" }), line(POWDER_B, "0", { max: "3" }),
    line(SUGAR_A, "23.5"), line(SUGAR_B, "10"), line(SUGAR_C, "0"), line(WMP_A, "14"), line(WMP_B, "4"),
    line(SMP_A, "3"), line(SMP_B, "0"), line(BUTTERMILK, "0", { max: "4" }), line(MILK_FAT, "1", { max: "3" }),
    line(LECITHIN, "0.4", { locked: true }), line(VANILLA, "0.1", { min: "0.1", max: "0.2" }),
  ],
  targetMode: "atLeast",
  target: "40",
};

export const CASES: readonly BenchCase[] = [DARK_8, MILK_20];

/** The engine's problem exactly as the panel builds it for this case (every category of the type). */
export function problemOf(c: BenchCase): LeastCostProblem {
  return toProblem(
    c.lines.map((l) => ({ ingredient: l.spec, percent: l.percent })),
    c.lines.map((l) => l.locked === true),
    { categories: categoriesFor(c.type).map(categoryKey), targetMode: c.targetMode, target: c.target, bounds: c.lines.map((l) => ({ min: l.min ?? "", max: l.max ?? "" })), objective: "cost" },
    BENCH_RESOLUTION,
  );
}
