import type Decimal from "decimal.js";
import { Dec, HUNDRED, ZERO, displayQuotient, readDecimal, toDecimalString } from "./decimal";
import { PROCESS_RANGES, type ProcessRangeName } from "./reference/process-ranges";
import type { DecimalInput } from "./types";

/** The bean-to-nib steps, in order. */
export type ChainStep = "sorting" | "roasting" | "winnowing";
export const CHAIN_STEPS: readonly ChainStep[] = ["sorting", "roasting", "winnowing"];

/** One recorded step, masses in kg. Sorting out = beans kept; roasting out = roasted beans; winnowing out = nibs. */
export interface ChainRecord {
  step: ChainStep;
  massInKg: DecimalInput;
  massOutKg: DecimalInput;
  rejectsKg?: DecimalInput | null;
  shellKg?: DecimalInput | null;
  dustKg?: DecimalInput | null;
}

export interface ChainNotice {
  code: "out-exceeds-in" | "parts-exceed-in" | "unaccounted" | "outside-range" | "more-than-previous" | "invalid";
  step?: ChainStep;
  message: string;
}

export interface ChainStepSummary {
  step: ChainStep;
  records: number;
  massInKg: string;
  massOutKg: string;
  /** out ÷ in × 100. */
  yieldPercent: string;
  /** Sorting: rejects ÷ in; roasting: (in − out) ÷ in; winnowing: shell ÷ in. The step's own loss figure. */
  lossPercent: string;
}

export interface ChainSummary {
  steps: ChainStepSummary[];
  /** Nibs out: recorded when winnowing is recorded, otherwise received × the estimated yield. */
  nibMassKg: string;
  nibMassEstimated: boolean;
  /** Nibs per raw bean received, %. */
  cumulativeYieldPercent: string;
  notices: ChainNotice[];
}

const read = (v: DecimalInput | null | undefined): Decimal | null => {
  if (v === null || v === undefined || v === "") return null;
  const r = readDecimal(v);
  return r.ok ? r.value : null;
};
const pct = (part: Decimal, whole: Decimal) => (whole.isZero() ? "0" : toDecimalString(displayQuotient(part.times(HUNDRED), whole)));
const kg = (d: Decimal) => toDecimalString(d);

/**
 * Checks one record's own masses before it is saved: nothing may come out of a
 * step that did not go in, and the parts (kept + rejects; nibs + shell + dust)
 * may not exceed the mass in. Returns human messages; empty means consistent.
 */
export function checkChainRecord(r: ChainRecord): ChainNotice[] {
  const inKg = read(r.massInKg);
  const outKg = read(r.massOutKg);
  if (!inKg || !outKg || inKg.lte(0) || outKg.lt(0)) {
    return [{ code: "invalid", step: r.step, message: "Enter the mass in (above 0 kg) and the mass out (0 kg or more)." }];
  }
  const notices: ChainNotice[] = [];
  if (outKg.gt(inKg)) {
    notices.push({ code: "out-exceeds-in", step: r.step, message: `Mass out (${kg(outKg)} kg) is more than mass in (${kg(inKg)} kg).` });
  }
  const parts = [outKg, read(r.rejectsKg), read(r.shellKg), read(r.dustKg)].reduce<Decimal>((s, p) => (p ? s.plus(p) : s), ZERO);
  if (outKg.lte(inKg) && parts.gt(inKg)) {
    notices.push({
      code: "parts-exceed-in",
      step: r.step,
      message: `The parts recorded (${kg(parts)} kg) add up to more than the mass in (${kg(inKg)} kg).`,
    });
  }
  return notices;
}

function rangeNotice(name: ProcessRangeName, value: Decimal, step: ChainStep | undefined, what: string): ChainNotice | null {
  const r = PROCESS_RANGES[name];
  if (value.gte(r.min) && value.lte(r.max)) return null;
  return {
    code: "outside-range",
    step,
    message: `${what} is ${value.toDecimalPlaces(1).toFixed(1)} %, outside the usual ${r.min}–${r.max} % (${r.source}).`,
  };
}

/**
 * Summarises a lot's chain from raw beans to nibs: each step's masses (several
 * records of one step add up, e.g. roasts in several oven loads), its yield and
 * loss, the nib mass (recorded, or estimated from `estimatedNibYieldPercent`)
 * and the cumulative yield, with notices for figures outside the usual ranges
 * (lib/formulation/reference/process-ranges.ts) or masses that do not add up.
 */
export function summariseChain(input: {
  massReceivedKg: DecimalInput;
  records: readonly ChainRecord[];
  estimatedNibYieldPercent: DecimalInput;
}): ChainSummary {
  const received = read(input.massReceivedKg) ?? ZERO;
  const notices: ChainNotice[] = [];
  const steps: ChainStepSummary[] = [];
  let previousOut: Decimal = received;
  let nibs: Decimal | null = null;
  for (const step of CHAIN_STEPS) {
    const recs = input.records.filter((r) => r.step === step);
    if (recs.length === 0) continue;
    for (const r of recs) notices.push(...checkChainRecord(r));
    const sum = (f: (r: ChainRecord) => DecimalInput | null | undefined) =>
      recs.reduce<Decimal>((s, r) => s.plus(read(f(r)) ?? ZERO), ZERO);
    const inKg = sum((r) => r.massInKg);
    const outKg = sum((r) => r.massOutKg);
    let loss: Decimal = ZERO;
    if (step === "sorting") loss = sum((r) => r.rejectsKg);
    if (step === "roasting") loss = inKg.minus(outKg);
    if (step === "winnowing") loss = sum((r) => r.shellKg);
    const lossPercent = inKg.isZero() ? ZERO : displayQuotient(loss.times(HUNDRED), inKg);
    steps.push({ step, records: recs.length, massInKg: kg(inKg), massOutKg: kg(outKg), yieldPercent: pct(outKg, inKg), lossPercent: toDecimalString(lossPercent) });

    if (inKg.gt(previousOut)) {
      notices.push({
        code: "more-than-previous",
        step,
        message: `${capital(step)} took in ${kg(inKg)} kg, more than the ${kg(previousOut)} kg the step before gave.`,
      });
    }
    if (!inKg.isZero()) {
      const named = { sorting: ["sortingRejectsPercent", "Sorting rejects"], roasting: ["roastLossPercent", "Roast loss"], winnowing: ["shellPercent", "Shell"] } as const;
      const [range, label] = named[step];
      const n = rangeNotice(range, lossPercent, step, label);
      if (n) notices.push(n);
    }
    if (step === "winnowing") {
      const accounted = outKg.plus(sum((r) => r.shellKg)).plus(sum((r) => r.dustKg));
      const gap = inKg.minus(accounted);
      if (gap.gt(inKg.times("0.01"))) {
        notices.push({ code: "unaccounted", step, message: `${kg(gap)} kg of the ${kg(inKg)} kg winnowed is not recorded as nibs, shell or dust.` });
      }
      nibs = outKg;
    }
    previousOut = outKg;
  }
  const estimate = read(input.estimatedNibYieldPercent) ?? new Dec(78);
  const nibMass = nibs ?? received.times(estimate).div(HUNDRED);
  const cumulative = received.isZero() ? ZERO : displayQuotient(nibMass.times(HUNDRED), received);
  if (nibs && !received.isZero()) {
    const n = rangeNotice("nibYieldPercent", cumulative, undefined, "Nib yield from raw beans");
    if (n) notices.push(n);
  }
  return {
    steps,
    nibMassKg: kg(nibMass),
    nibMassEstimated: nibs === null,
    cumulativeYieldPercent: toDecimalString(cumulative),
    notices,
  };
}

/**
 * Cost per kg of nibs: (price paid + extra costs + processing costs) ÷ nib mass,
 * all amounts already in one currency. Null when the nib mass is not above 0.
 */
export function nibCostPerKg(input: {
  pricePaid: DecimalInput;
  extraCosts?: readonly DecimalInput[];
  processingCosts?: readonly DecimalInput[];
  nibMassKg: DecimalInput;
}): string | null {
  const nibs = read(input.nibMassKg);
  if (!nibs || nibs.lte(0)) return null;
  const total = [input.pricePaid, ...(input.extraCosts ?? []), ...(input.processingCosts ?? [])].reduce<Decimal>(
    (s, v) => s.plus(read(v) ?? ZERO),
    ZERO,
  );
  return toDecimalString(displayQuotient(total, nibs));
}

/** °C → °F exactly: F = C × 9/5 + 32 (so 132 °C = 269.6 °F). */
export function celsiusToFahrenheit(c: DecimalInput): string | null {
  const v = read(c);
  return v ? toDecimalString(v.times(9).div(5).plus(32)) : null;
}

function capital(s: string) {
  return s.charAt(0).toUpperCase() + s.slice(1);
}
