/**
 * Speed benchmark of the formulation engine (not a test): a full evaluation of a 12-line
 * recipe against every standard, and one slider rebalance. Prints operations per second and
 * the median time of one call. Targets (issue 3): evaluation < 200 µs, rebalance < 100 µs.
 * Run: npx tsx scripts/bench-engine.ts
 */
import { evaluateRecipe, rebalance, type RecipeLine } from "../lib/formulation";

const line = (name: string, percent: string, fields: Omit<RecipeLine["ingredient"], "name">): RecipeLine => ({
  ingredient: { name, ...fields },
  percent,
});

/** A 12-line milk chocolate with two inclusions: every code path of the evaluation is used. */
const RECIPE: RecipeLine[] = [
  line("Cocoa nibs A", "18.5", { cocoaButter: 55, cocoaSolidsNonFat: 43, moisture: 2, pricePerKg: "14.20" }),
  line("Cocoa nibs B", "8", { cocoaButter: "54.5", cocoaSolidsNonFat: "43.3", moisture: "2.2", pricePerKg: "16.75" }),
  line("Cocoa liquor", "5", { cocoaButter: "52.31", cocoaSolidsNonFat: "46.35", moisture: "1.34", pricePerKg: "11.40" }),
  line("Cocoa butter", "12", { cocoaButter: 100, pricePerKg: "18.90" }),
  line("Whole milk powder", "16", { milkFat: "26.71", milkSolidsNonFat: "70.82", moisture: "2.47", pricePerKg: "5.10" }),
  line("Skim milk powder", "3", { milkFat: "0.77", milkSolidsNonFat: "96.07", moisture: "3.16", pricePerKg: "3.90" }),
  line("Sugar", "26.1", { sugar: "99.98", moisture: "0.02", pricePerKg: "1.05" }),
  line("Brown sugar", "2", { sugar: 97, moisture: 1.5, pricePerKg: "1.60" }),
  line("Soy lecithin", "0.4", { pricePerKg: "6.20" }),
  line("Vanilla", "0.05", { pricePerKg: "620" }),
  line("Salt", "0.45", { moisture: "0.1", pricePerKg: "0.80" }),
  line("Roasted hazelnuts", "8.5", { inclusion: true, vegetableFat: 61, moisture: 2, pricePerKg: "12.30" }),
];

function measure(name: string, run: () => unknown, iterations: number): void {
  for (let i = 0; i < Math.min(2000, iterations); i++) run();
  const times = new Float64Array(iterations);
  const started = process.hrtime.bigint();
  for (let i = 0; i < iterations; i++) {
    const t0 = process.hrtime.bigint();
    run();
    times[i] = Number(process.hrtime.bigint() - t0) / 1000;
  }
  const elapsedSeconds = Number(process.hrtime.bigint() - started) / 1e9;
  times.sort();
  const median = times[Math.floor(iterations / 2)] ?? 0;
  const p95 = times[Math.floor(iterations * 0.95)] ?? 0;
  const perSecond = Math.round(iterations / elapsedSeconds);
  console.log(`${name.padEnd(34)} ${String(perSecond).padStart(8)} /s   median ${median.toFixed(1).padStart(7)} µs   p95 ${p95.toFixed(1).padStart(7)} µs`);
}

const recipe = { lines: RECIPE };
let slider = 0;
console.log(`Node ${process.version}, 12-line recipe, all authorities`);
measure("evaluateRecipe (EU + US + Codex)", () => evaluateRecipe(recipe), 20_000);
measure("rebalance (0.1 % grid, 1 locked)", () => {
  slider = (slider + 1) % 200;
  return rebalance(RECIPE, 0, 10 + slider / 10, { locked: [false, false, false, false, false, false, false, false, true] });
}, 50_000);
