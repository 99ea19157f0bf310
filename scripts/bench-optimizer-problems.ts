/**
 * The least-cost problems the optimizer benchmark times (invented demo prices per kg). Shared by
 * scripts/bench-optimizer.ts (Node) and its browser twin, so both time the same work.
 */
import type { IngredientSpec, LeastCostLine, LeastCostProblem } from "../lib/formulation";

const spec = (name: string, pricePerKg: string, fields: Omit<IngredientSpec, "name" | "pricePerKg">): IngredientSpec => ({ name, pricePerKg, ...fields });
const free = (ingredient: IngredientSpec, percent: string, extra: Partial<LeastCostLine> = {}): LeastCostLine => ({ ingredient, percent, ...extra });

// Compositions: REFERENCE.md §3 (USDA FDC 167568, 171421, 169655, 173454, 170877) and common
// practice for nibs (butter ≈ 55 %, moisture ≈ 2 %); origins vary the fat a little.
const NIBS_A = spec("Cocoa nibs, Ecuador", "9.40", { cocoaButter: 55, cocoaSolidsNonFat: 43, moisture: 2 });
const NIBS_B = spec("Cocoa nibs, Ghana", "8.60", { cocoaButter: "53.5", cocoaSolidsNonFat: "44.3", moisture: "2.2" });
const NIBS_C = spec("Cocoa nibs, Madagascar", "11.20", { cocoaButter: "56.2", cocoaSolidsNonFat: "42", moisture: "1.8" });
const LIQUOR_A = spec("Cocoa liquor", "10.10", { cocoaButter: "52.31", cocoaSolidsNonFat: "46.35", moisture: "1.34" });
const LIQUOR_B = spec("Cocoa liquor, Peru", "10.80", { cocoaButter: "54", cocoaSolidsNonFat: "44.5", moisture: "1.5" });
const BUTTER_A = spec("Cocoa butter", "15.80", { cocoaButter: 100 });
const BUTTER_B = spec("Cocoa butter, deodorised", "14.90", { cocoaButter: 100 });
const POWDER_A = spec("Cocoa powder 10–12 %", "5.90", { cocoaButter: 11, cocoaSolidsNonFat: 86, moisture: 3 });
const POWDER_B = spec("Cocoa powder 20–22 %", "6.70", { cocoaButter: 21, cocoaSolidsNonFat: 76, moisture: 3 });
const SUGAR_A = spec("Cane sugar", "1.15", { sugar: "99.98", moisture: "0.02" });
const SUGAR_B = spec("Beet sugar", "0.98", { sugar: "99.95", moisture: "0.05" });
const SUGAR_C = spec("Coconut sugar", "6.50", { sugar: 94, moisture: 2 });
const WMP_A = spec("Whole milk powder", "4.90", { milkFat: "26.71", milkSolidsNonFat: "70.82", moisture: "2.47" });
const WMP_B = spec("Whole milk powder, high fat", "5.40", { milkFat: "28.5", milkSolidsNonFat: "69", moisture: "2.5" });
const SMP_A = spec("Skim milk powder", "3.70", { milkFat: "0.77", milkSolidsNonFat: "96.07", moisture: "3.16" });
const SMP_B = spec("Skim milk powder, low heat", "3.95", { milkFat: "1", milkSolidsNonFat: "95.5", moisture: "3.5" });
const BUTTERMILK = spec("Buttermilk powder", "3.30", { milkFat: "5.8", milkSolidsNonFat: "91.2", moisture: "3" });
const MILK_FAT = spec("Anhydrous milk fat", "8.20", { milkFat: "99.8", moisture: "0.1" });
const LECITHIN = spec("Soy lecithin", "6.20", {});
const VANILLA = spec("Vanilla (ground pods)", "620", {});

/** A 70 % dark from 8 lines: EU and Codex chocolate, US semisweet; ≥ 8 % added butter, ≤ 0.5 % lecithin. */
export const DARK_8: LeastCostProblem = {
  lines: [
    free(NIBS_A, "40"), free(NIBS_B, "15"), free(LIQUOR_A, "6"), free(BUTTER_A, "9", { min: "8" }),
    free(POWDER_A, "0"), free(SUGAR_A, "29.6"), free(LECITHIN, "0.4", { min: "0.2", max: "0.5" }), free(VANILLA, "0", { max: "0.1" }),
  ],
  limits: [{ quantity: "totalDryCocoaSolids", basis: "eu", value: 70 }],
  categories: [
    { authority: "EU", category: "chocolate" },
    { authority: "Codex", category: "chocolate" },
    { authority: "US", category: "semisweet chocolate" },
  ],
};

/** A 40 % milk from 20 lines: EU, US and Codex milk chocolate, fat 34–38 %, one locked line. */
export const MILK_20: LeastCostProblem = {
  lines: [
    free(NIBS_A, "12"), free(NIBS_B, "8"), free(NIBS_C, "4", { max: "10" }), free(LIQUOR_A, "4"), free(LIQUOR_B, "0"),
    free(BUTTER_A, "10"), free(BUTTER_B, "6"), free(POWDER_A, "0", { max: "3" }), free(POWDER_B, "0", { max: "3" }),
    free(SUGAR_A, "20"), free(SUGAR_B, "10"), free(SUGAR_C, "0"), free(WMP_A, "14"), free(WMP_B, "4"),
    free(SMP_A, "3"), free(SMP_B, "0"), free(BUTTERMILK, "0", { max: "4" }), free(MILK_FAT, "1", { max: "3" }),
    free(LECITHIN, "0.45", { locked: true }), free(VANILLA, "0.05", { min: "0.03", max: "0.1" }),
  ],
  limits: [
    { quantity: "totalDryCocoaSolids", basis: "eu", min: 40 },
    { quantity: "totalFat", basis: "product", min: 34, max: 38 },
  ],
  categories: [
    { authority: "EU", category: "milk chocolate" },
    { authority: "US", category: "milk chocolate" },
    { authority: "Codex", category: "milk chocolate" },
  ],
};
