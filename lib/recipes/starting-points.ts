import type { ChocolateType } from "./types";

/** A recipe to start from: lines name engine reference ingredients by key (lib/formulation DEFAULT_INGREDIENTS). */
export type StartingPoint = {
  key: string;
  name: string;
  description: string;
  chocolateType: ChocolateType;
  targetCocoaPercent: string;
  barMassGrams: string;
  lines: ReadonlyArray<{ referenceKey: string; percent: string }>;
};

/**
 * Barwright's own starting points, worked out with the engine's reference
 * profiles (nibs: 55 % cocoa butter, 2 % water; whole milk powder: FDC 173454).
 * Each meets its own category with room to spare; a maker tunes from here.
 */
export const STARTING_POINTS: readonly StartingPoint[] = [
  {
    key: "classic-dark-70",
    name: "Classic dark, 70 %",
    description: "Nibs, a little added cocoa butter, sugar and lecithin: 70 % total dry cocoa solids.",
    chocolateType: "dark",
    targetCocoaPercent: "70",
    barMassGrams: "70",
    // 64 × 0.98 + 7.3 = 70.02 % dry cocoa solids.
    lines: [
      { referenceKey: "cocoa-nibs", percent: "64" },
      { referenceKey: "cocoa-butter", percent: "7.3" },
      { referenceKey: "sucrose", percent: "28.4" },
      { referenceKey: "soy-lecithin", percent: "0.3" },
    ],
  },
  {
    key: "milk-40",
    name: "Milk, 40 %",
    description: "A rich milk chocolate: 40 % total dry cocoa solids, 24 % whole milk powder.",
    chocolateType: "milk",
    targetCocoaPercent: "40",
    barMassGrams: "70",
    // 28 × 0.98 + 13 = 40.44 % dry cocoa solids; 24 × 0.9753 = 23.4 % dry milk solids.
    lines: [
      { referenceKey: "cocoa-nibs", percent: "28" },
      { referenceKey: "cocoa-butter", percent: "13" },
      { referenceKey: "whole-milk-powder", percent: "24" },
      { referenceKey: "sucrose", percent: "34.6" },
      { referenceKey: "soy-lecithin", percent: "0.4" },
    ],
  },
  {
    key: "white-33",
    name: "White, 33 %",
    description: "Cocoa butter, whole milk powder, sugar and a touch of vanilla: 33 % cocoa butter.",
    chocolateType: "white",
    targetCocoaPercent: "33",
    barMassGrams: "70",
    lines: [
      { referenceKey: "cocoa-butter", percent: "33" },
      { referenceKey: "whole-milk-powder", percent: "26" },
      { referenceKey: "sucrose", percent: "40.5" },
      { referenceKey: "soy-lecithin", percent: "0.4" },
      { referenceKey: "vanilla", percent: "0.1" },
    ],
  },
];

export function findStartingPoint(key: string): StartingPoint | undefined {
  return STARTING_POINTS.find((p) => p.key === key);
}
