import { apportion } from "./apportion";

/** Input of the slider rule, every figure a count of the same small unit (see fixed.ts). */
export interface DistributeInput {
  /** Current value of each line, ≥ 0. */
  current: readonly bigint[];
  locked: readonly boolean[];
  /** 100 % in units. */
  whole: bigint;
  /** One grid step in units; divides `whole`. */
  step: bigint;
  /** Index of the line being set, or -1 to only share the total out (normalise). */
  changed: number;
  /** Requested value of the changed line (ignored when changed is -1 or locked). */
  requested: bigint;
  /** Bounds for the changed line, already within [0, whole]. */
  low: bigint;
  high: bigint;
}

/** Output of the slider rule. */
export interface DistributeOutput {
  values: bigint[];
  /** Why the changed line did not get the requested value, if it did not. */
  clampedBy?: "bounds" | "locked" | "alone" | "over-locked";
  notes: string[];
}

function snap(value: bigint, step: bigint, low: bigint, high: bigint): bigint {
  let snapped = ((2n * value + step) / (2n * step)) * step;
  if (snapped > high) snapped -= step;
  if (snapped < low) snapped += step;
  return snapped >= low && snapped <= high ? snapped : high;
}

/**
 * The slider rule on exact integers. Locked lines keep their value. The changed line takes the
 * requested value, clamped to [low, high] and to what is left beside the locked lines, then
 * snapped to the grid; the other unlocked lines share what remains in proportion to their
 * current values (equally when all are 0) by largest remainder on the grid. If the locked
 * lines are off the grid, the sub-step residue goes to the largest free line, with a note.
 */
export function distribute(input: DistributeInput): DistributeOutput {
  const { current, locked, whole, step, changed } = input;
  const notes: string[] = [];
  const values = current.slice();
  let lockedSum = 0n;
  for (let i = 0; i < current.length; i++) if (locked[i]) lockedSum += current[i] as bigint;
  const available = whole - lockedSum;
  if (available < 0n) {
    notes.push("The locked lines add up to more than 100 %; nothing was moved.");
    return { values, clampedBy: "over-locked", notes };
  }
  const free: number[] = [];
  for (let i = 0; i < current.length; i++) if (!locked[i] && i !== changed) free.push(i);
  let clampedBy: DistributeOutput["clampedBy"];
  let remaining = available;
  if (changed >= 0 && !locked[changed]) {
    const high = input.high < available ? input.high : available;
    const low = input.low > high ? high : input.low;
    const wanted = input.requested < low ? low : input.requested > high ? high : input.requested;
    if (wanted !== input.requested) clampedBy = "bounds";
    const value = free.length === 0 ? available : snap(wanted, step, low, high);
    if (free.length === 0 && value !== input.requested) {
      clampedBy = "alone";
      notes.push("No other unlocked line can take up the difference; the line fills what the locked lines leave.");
    }
    values[changed] = value;
    remaining = available - value;
  } else if (changed >= 0) {
    if (input.requested !== current[changed]) clampedBy = "locked";
    notes.push("That line is locked; unlock it to change it.");
  }
  if (free.length === 0) {
    if (remaining !== 0n) notes.push("Every other line is locked, so the lines cannot add up to 100 %.");
    return clampedBy === undefined ? { values, notes } : { values, clampedBy, notes };
  }
  const shares = apportion(remaining / step, free.map((i) => current[i] as bigint));
  let largest = 0;
  free.forEach((line, k) => {
    values[line] = (shares[k] as bigint) * step;
    if ((values[line] as bigint) > (values[free[largest] as number] as bigint)) largest = k;
  });
  const residue = remaining % step;
  if (residue !== 0n) {
    const line = free[largest] as number;
    values[line] = (values[line] as bigint) + residue;
    notes.push(`The locked lines are off the grid, so line ${line + 1} carries the remainder below one step.`);
  }
  return clampedBy === undefined ? { values, notes } : { values, clampedBy, notes };
}
