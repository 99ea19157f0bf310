import { apportion } from "./apportion";

/**
 * Splits line masses (whole steps) into `count` loads whose sizes differ by at most one step
 * (the larger ones first). Loads are filled in turn, each in proportion to what is left of
 * every line (largest remainder), and the last takes the rest, so each load sums to its size,
 * each line's loads sum to its mass and no entry is negative: a line's share
 * ceil(size × left / Σleft) never exceeds what is left of it, because size ≤ Σleft.
 */
export function splitIntoLoads(masses: readonly bigint[], count: number): bigint[][] {
  const total = masses.reduce((a, b) => a + b, 0n);
  const n = BigInt(count);
  const base = total / n;
  const larger = Number(total % n);
  const left = masses.slice();
  const loads: bigint[][] = [];
  for (let j = 0; j < count - 1; j++) {
    const size = base + (j < larger ? 1n : 0n);
    const load = apportion(size, left);
    load.forEach((mass, i) => {
      left[i] = (left[i] as bigint) - mass;
    });
    loads.push(load);
  }
  loads.push(left);
  return loads;
}
