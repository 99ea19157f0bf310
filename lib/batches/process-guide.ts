/**
 * The process steps printed on a batch sheet, with the planner's own figures
 * and the typical ranges beside them. Every range is common practice of the
 * trade with no single source, as collected in /work/shared/REFERENCE.md §5;
 * none is a validated process or a food-safety limit.
 */
import type { ChocolateType } from "@/db/schema/recipes";

export type GuideParameter = { label: string; planned: string | null; typical: string };
export type GuideStep = { key: string; title: string; parameters: GuideParameter[]; note?: string };

export const GUIDE_SOURCE = "Typical ranges: common practice, no single source (Barwright reference notes §5).";

export const PROCESS_CAUTION =
  "Process parameters must follow your own validated process and the food-safety rules that apply where you make " +
  "chocolate. Typical ranges are for orientation only; they are not a validated kill step or a safety limit.";

/** Tempering curve by chocolate type, °C: melt, cool, work. REFERENCE.md §5, common practice. */
export const TEMPERING_CURVES: Record<Exclude<ChocolateType, "other">, { melt: string; cool: string; work: string }> = {
  dark: { melt: "45–55 °C", cool: "27–29 °C", work: "31–32 °C" },
  milk: { melt: "40–50 °C", cool: "27–28 °C", work: "29–31 °C" },
  white: { melt: "40–45 °C", cool: "25–27 °C", work: "28–30 °C" },
};

/** Conching mass temperature, REFERENCE.md §5 (no range given there for white). */
const CONCHING_TEMPERATURE: Partial<Record<ChocolateType, string>> = { dark: "45–80 °C", milk: "43–57 °C" };

const OWN = "your validated process";

export function processGuide(input: {
  chocolateType: ChocolateType;
  roast?: { presetName: string | null; temperatureC: string | null; minutes: string | null };
  refiningHours?: string | null;
  conchingHours?: string | null;
}): GuideStep[] {
  const roast = input.roast;
  const curve = input.chocolateType === "other" ? null : TEMPERING_CURVES[input.chocolateType];
  return [
    {
      key: "roasting",
      title: "Roasting (of the beans the nibs come from)",
      parameters: [
        { label: "Roast profile", planned: roast?.presetName ?? null, typical: "craft whole-bean 120–140 °C for 15–40 min" },
        { label: "Temperature", planned: roast?.temperatureC ? `${roast.temperatureC} °C` : null, typical: "120–140 °C" },
        { label: "Time", planned: roast?.minutes ? `${roast.minutes} min` : null, typical: "15–40 min" },
      ],
      note: "Roasting is recorded on each bean lot; check the lots' processing records.",
    },
    {
      key: "refining",
      title: "Refining",
      parameters: [
        { label: "Refining time", planned: input.refiningHours ? `${input.refiningHours} h` : null, typical: `depends on the machine and load: ${OWN}` },
        { label: "Particle size", planned: null, typical: "largest particles below ≈ 20–30 µm; below ≈ 10 µm turns gummy" },
      ],
    },
    {
      key: "conching",
      title: "Conching",
      parameters: [
        { label: "Conching time", planned: input.conchingHours ? `${input.conchingHours} h` : null, typical: "6–72 h" },
        {
          label: "Mass temperature",
          planned: null,
          typical: CONCHING_TEMPERATURE[input.chocolateType] ?? `no typical range in our reference: ${OWN}`,
        },
      ],
      note: "Lecithin usually goes in near the end of conching (common practice).",
    },
    {
      key: "tempering",
      title: "Tempering",
      parameters: curve
        ? [
            { label: "Melt", planned: null, typical: curve.melt },
            { label: "Cool", planned: null, typical: curve.cool },
            { label: "Work", planned: null, typical: curve.work },
          ]
        : [{ label: "Curve", planned: null, typical: `set by ${OWN} for this chocolate` }],
      note: "The curve aims for cocoa butter form V (melts at ≈ 33.8 °C). Check temper before moulding.",
    },
    {
      key: "storage",
      title: "Storage of bars",
      parameters: [{ label: "Conditions", planned: null, typical: "15–18 °C, relative humidity below 55 %" }],
    },
  ];
}
