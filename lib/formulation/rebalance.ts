import type { Decimal } from "decimal.js";
import { HUNDRED, ZERO, describeInput, readDecimal, toDecimalString } from "./decimal";
import { distribute } from "./distribute";
import { commonScale, formatUnits, powerOfTen, toUnits } from "./fixed";
import { parsePercents } from "./input";
import { readPercentResolution } from "./resolution";
import type { DecimalInput } from "./types";
import type { FormulationWarning } from "./warnings";

/** Options of the slider rule. Percent bounds apply to the changed line only. */
export interface RebalanceOptions {
  /** `locked[i] === true` keeps line i where it is. */
  locked?: readonly boolean[];
  /** Grid step in percent; must divide 100. Default 0.1. */
  resolution?: DecimalInput;
  /** Lowest value the changed line may take (percent). */
  min?: DecimalInput;
  /** Highest value the changed line may take (percent). */
  max?: DecimalInput;
}

/** A line with its percent replaced by a decimal string. */
export type RebalancedLine<T> = Omit<T, "percent"> & { percent: string };

/** What the slider rule did. */
export interface RebalanceResult<T> {
  /** Copies of the input lines with new percents (decimal strings summing to exactly 100). */
  lines: RebalancedLine<T>[];
  /** The percent the changed line got ("0" when there is no such line). */
  applied: string;
  /** True when the request could not be applied as asked (bounds, locks, nothing to absorb it). */
  clamped: boolean;
  /** Sentences explaining any clamp, repair or fallback. */
  message?: string;
}

function readBound(input: unknown, name: string, notes: string[]): Decimal | undefined {
  const read = readDecimal(input);
  if (read.ok) return read.value;
  if (read.problem !== "missing") notes.push(`${name} ${describeInput(input)} is not a number; it is ignored.`);
  return undefined;
}

function copyLine<T>(line: T, percent: string): RebalancedLine<T> {
  const base = typeof line === "object" && line !== null ? line : {};
  return { ...(base as T), percent } as RebalancedLine<T>;
}

/**
 * The slider rule. Line `changedIndex` takes `newPercent`, clamped to [min, max] ∩ [0, 100 −
 * locked lines] and snapped to the resolution (default 0.1 %); the other unlocked lines absorb
 * the difference in proportion to their current values (equally when all are 0); locked lines
 * never move. The result sums to exactly 100 on the grid (largest remainder), with no negative
 * line, even when the input did not sum to 100 (said in `message`). Impossible cases (locked
 * lines above 100 %, every line locked) leave the lines unmoved and say so. Bad numbers count
 * as 0 (percents) or are ignored (bounds), with a note. Never throws.
 */
export function rebalance<T extends { percent?: unknown }>(
  lines: readonly T[],
  changedIndex: number,
  newPercent: DecimalInput,
  options: RebalanceOptions = {},
): RebalanceResult<T> {
  const warnings: FormulationWarning[] = [];
  const percents = parsePercents(lines, warnings);
  const notes = warnings.map((w) => w.message);
  const opts: RebalanceOptions = typeof options === "object" && options !== null ? options : {};
  const resolution = readPercentResolution(opts.resolution, notes);
  const changed = Number.isInteger(changedIndex) && changedIndex >= 0 && changedIndex < percents.length ? changedIndex : -1;
  if (changed < 0) notes.push(`There is no line at index ${describeInput(changedIndex)}; the lines were only brought to 100 %.`);
  const requestedRead = readDecimal(newPercent);
  if (changed >= 0 && !requestedRead.ok) notes.push(`The new percent ${describeInput(newPercent)} is not a number; the line keeps its value.`);
  const requested = requestedRead.ok ? requestedRead.value : (percents[changed] ?? ZERO);
  const min = readBound(opts.min, "min", notes);
  const max = readBound(opts.max, "max", notes);
  const scale = commonScale([...percents, resolution, requested, min, max]);
  const whole = 100n * powerOfTen(scale);
  const bound = (value: Decimal | undefined, fallback: bigint): bigint =>
    value === undefined ? fallback : value.lte(ZERO) ? 0n : value.gte(HUNDRED) ? whole : toUnits(value, scale);
  const current = percents.map((p) => toUnits(p, scale));
  const out = distribute({
    current,
    locked: percents.map((_, i) => opts.locked?.[i] === true),
    whole,
    step: toUnits(resolution, scale),
    changed,
    requested: toUnits(requested, scale),
    low: bound(min, 0n),
    high: bound(max, whole),
  });
  const total = current.reduce((a, b) => a + b, 0n);
  if (total !== whole && percents.length > 0 && out.clampedBy !== "over-locked") {
    notes.push(`The lines added up to ${formatUnits(total, scale)} %; they now add up to 100 %.`);
  }
  const applied = changed >= 0 ? formatUnits(out.values[changed] as bigint, scale) : "0";
  if (out.clampedBy === "bounds") {
    notes.unshift(`The line was limited to ${applied} % (asked ${toDecimalString(requested)} %).`);
  }
  notes.push(...out.notes);
  const list: readonly T[] = Array.isArray(lines) ? lines : [];
  const result: RebalanceResult<T> = {
    lines: list.map((line, i) => copyLine(line, formatUnits(out.values[i] ?? 0n, scale))),
    applied,
    clamped: out.clampedBy !== undefined && changed >= 0,
  };
  if (notes.length > 0) result.message = notes.join(" ");
  return result;
}
