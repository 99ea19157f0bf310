/**
 * Typical ranges of the bean-to-nib chain, used to flag figures worth a second
 * look (not limits). Values and sources: /work/shared/REFERENCE.md §5.
 */
export interface ProcessRange {
  readonly min: string;
  readonly max: string;
  readonly source: string;
}

export const PROCESS_RANGES = {
  /** Rejects at sorting, % of beans in. */
  sortingRejectsPercent: { min: "0", max: "5", source: "a few percent for a sound lot: common practice, no single source (from memory)" },
  /** Moisture lost in roasting, % of beans in. */
  roastLossPercent: { min: "4", max: "6", source: "≈ 4–6 % of bean mass: common practice, no single source" },
  /** Shell (husk) removed at winnowing, % of roasted beans in. */
  shellPercent: { min: "10", max: "15", source: "10–15 % of bean mass (12–14 % most quoted): common practice, no single source" },
  /** Nibs out per raw bean received, %. */
  nibYieldPercent: { min: "75", max: "82", source: "≈ 75–82 % after roast and winnow: common practice, no single source" },
  /** Craft whole-bean roasting temperature, °C. */
  roastTemperatureC: { min: "120", max: "140", source: "craft whole-bean 120–140 °C: common practice, no single source" },
  /** Craft whole-bean roasting time, minutes. */
  roastMinutes: { min: "15", max: "40", source: "craft whole-bean 15–40 min: common practice, no single source" },
} as const satisfies Record<string, ProcessRange>;

export type ProcessRangeName = keyof typeof PROCESS_RANGES;
