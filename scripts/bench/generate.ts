/**
 * Deterministic, invented data for the load benchmark's large workspace: the
 * same names and figures on every run (a seeded PRNG, no clock). Every name is
 * invented and marked as generated; prices are invented.
 */
import { createHash } from "node:crypto";
import Decimal from "decimal.js";
import type { ChocolateType } from "../../db/schema/recipes";

/** mulberry32: a small seeded PRNG, enough to spread test data evenly. */
export function prng(seed: number): () => number {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

/** A stable UUID (v4 layout) for a label, so ids are the same on every run. */
export function stableUuid(label: string): string {
  const h = createHash("sha256").update(`barwright-bench:${label}`).digest("hex");
  return `${h.slice(0, 8)}-${h.slice(8, 12)}-4${h.slice(13, 16)}-${((parseInt(h[16]!, 16) & 3) | 8).toString(16)}${h.slice(17, 20)}-${h.slice(20, 32)}`;
}

const WORDS = ["Harbour", "Lantern", "Meadow", "Ember", "Copper", "Juniper", "Saffron", "Tidewater", "Orchard", "Quarry", "Bramble", "Kestrel"];
export const ORIGINS = ["Ecuador", "Ghana", "Madagascar", "Peru", "Tanzania", "Belize", "Vietnam", "Dominican Republic"];
const TYPE_WORDS: Record<ChocolateType, string> = { dark: "dark", milk: "milk", white: "white", other: "blend" };

/** The chocolate types of the generated recipes, in turn (no "other": every recipe gets a real formulation). */
export const GENERATED_TYPES: ChocolateType[] = ["dark", "dark", "milk", "white"];

export function recipeName(seq: number, type: ChocolateType): string {
  return `${WORDS[seq % WORDS.length]} ${ORIGINS[Math.floor(seq / WORDS.length) % ORIGINS.length]} ${TYPE_WORDS[type]} No. ${String(seq + 1).padStart(5, "0")}`;
}

export const supplierName = (i: number) => `${WORDS[i % WORDS.length]} ${["Trading", "Importers", "Mills", "Supply", "Provisions"][i % 5]} ${String(i + 1).padStart(2, "0")} (generated)`;

export const lotCode = (i: number) => `GEN-${2025 + (i % 2)}-${String(i + 1).padStart(4, "0")}`;
export const producerName = (i: number) => `${WORDS[(i * 5) % WORDS.length]} Growers Cooperative (invented)`;

/** One line of a formulation: which reference profile (and which of its generated variants), and its percent. */
export type FormulationLine = { key: string; variant: number; percent: string };

const d1 = (rand: () => number, lo: number, hi: number) => new Decimal(lo + rand() * (hi - lo)).toDecimalPlaces(1);

/**
 * `count` formulations of a type with lines that add up to exactly 100 (sugar takes the rest).
 * Figures are our own, in the usual ranges of each kind of bar.
 */
export function formulations(type: ChocolateType, count: number, variants: number): FormulationLine[][] {
  const rand = prng(type.length * 7919 + count);
  const v = () => Math.floor(rand() * variants);
  const out: FormulationLine[][] = [];
  for (let i = 0; i < count; i++) {
    const parts: [string, Decimal][] =
      type === "dark"
        ? [["cocoa-nibs", d1(rand, 55, 75)], ["cocoa-butter", d1(rand, 2, 10)], ["soy-lecithin", new Decimal("0.4")], ["vanilla", new Decimal("0.1")]]
        : type === "milk"
          ? [["cocoa-nibs", d1(rand, 20, 32)], ["cocoa-butter", d1(rand, 14, 22)], ["whole-milk-powder", d1(rand, 18, 26)], ["soy-lecithin", new Decimal("0.4")]]
          : [["cocoa-butter", d1(rand, 28, 35)], ["whole-milk-powder", d1(rand, 20, 28)], ["skim-milk-powder", d1(rand, 0.5, 5)], ["soy-lecithin", new Decimal("0.3")], ["vanilla", new Decimal("0.1")]];
    const rest = parts.reduce((sum, [, p]) => sum.minus(p), new Decimal(100));
    const lines = [...parts.slice(0, -1), ["sucrose", rest] as [string, Decimal], ...parts.slice(-1)];
    out.push(lines.map(([key, p]) => ({ key, variant: v(), percent: p.toFixed() })));
  }
  return out;
}
