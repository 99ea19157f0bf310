/**
 * Largest-remainder (Hamilton) split of a whole number of steps: `total` (≥ 0) is divided in
 * proportion to `weights` (each ≥ 0), every part a whole number, the parts summing exactly to
 * `total`. Each part first gets floor(total × w / Σw); the steps left over go one each to the
 * parts with the largest remainders, ties to the lower index. All weights 0 means equal shares.
 * Returns [] for no weights. Exact: bigint arithmetic throughout.
 */
export function apportion(total: bigint, weights: readonly bigint[]): bigint[] {
  const n = weights.length;
  if (n === 0) return [];
  let sum = 0n;
  for (const weight of weights) sum += weight;
  const equal = sum === 0n;
  const divisor = equal ? BigInt(n) : sum;
  const parts: bigint[] = new Array<bigint>(n);
  const remainders: bigint[] = new Array<bigint>(n);
  let assigned = 0n;
  for (let i = 0; i < n; i++) {
    const numerator = total * (equal ? 1n : (weights[i] as bigint));
    const part = numerator / divisor;
    parts[i] = part;
    remainders[i] = numerator % divisor;
    assigned += part;
  }
  let left = total - assigned;
  if (left === 0n) return parts;
  const order = parts.map((_, i) => i);
  order.sort((a, b) => {
    const ra = remainders[a] as bigint;
    const rb = remainders[b] as bigint;
    return ra === rb ? a - b : rb > ra ? 1 : -1;
  });
  for (const i of order) {
    if (left === 0n) break;
    parts[i] = (parts[i] as bigint) + 1n;
    left -= 1n;
  }
  return parts;
}
