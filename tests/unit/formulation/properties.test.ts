import { describe, expect, it } from "vitest";
import fc from "fast-check";
import Decimal from "decimal.js";
import { evaluateRecipe, normalizePercents, rebalance, scaleBatch, type Recipe } from "@/lib/formulation";

// Property tests (issue 3): thousands of generated inputs per property. decimal.js is used here
// only to add up the engine's output strings exactly.
/** Generous per-property limit for slower machines; each runs in about a second here. */
const TIMEOUT = 20_000;
const sum = (values: readonly string[]) => values.reduce((a, v) => a.plus(v), new Decimal(0));
const thousandths = (n: number) => new Decimal(n).div(1000).toFixed();

/** A percent between 0 and 100 with up to three decimals, as a string or a number. */
const percentArb = fc.integer({ min: 0, max: 100_000 }).chain((n) => fc.constantFrom(thousandths(n), Number(thousandths(n))));

describe("rebalance properties", () => {
  const input = fc
    .array(fc.record({ percent: percentArb, locked: fc.boolean() }), { minLength: 1, maxLength: 12 })
    .chain((lines) =>
      fc.record({
        lines: fc.constant(lines),
        changed: fc.integer({ min: 0, max: lines.length - 1 }),
        target: fc.oneof(percentArb, fc.integer({ min: -50, max: 150 })),
        resolution: fc.constantFrom("0.1", "0.5", "1", "0.01", "0.001"),
      }),
    )
    // Locked lines must leave room, and something must be free to move.
    .filter(({ lines }) => lines.some((l) => !l.locked) && sum(lines.filter((l) => l.locked).map((l) => String(l.percent))).lte(100));

  it("always sums to exactly 100, never moves a locked line, never goes negative", () => {
    fc.assert(
      fc.property(input, ({ lines, changed, target, resolution }) => {
        const locked = lines.map((l) => l.locked);
        const result = rebalance(lines, changed, target, { locked, resolution });
        const out = result.lines.map((l) => new Decimal(l.percent));
        const problems: string[] = [];
        if (!sum(result.lines.map((l) => l.percent)).eq(100)) problems.push("sum is not 100");
        lines.forEach((l, i) => {
          if (l.locked && !out[i]!.eq(String(l.percent))) problems.push(`locked line ${i} moved`);
          if (out[i]!.isNegative()) problems.push(`line ${i} negative`);
        });
        // The changed line, when free, not clamped and on a grid the locked lines respect, lands
        // within half a step of the request.
        const lockedSum = sum(lines.filter((l) => l.locked).map((l) => String(l.percent)));
        if (!locked[changed] && !result.clamped && lockedSum.mod(resolution).isZero()) {
          if (new Decimal(result.applied).minus(String(target)).abs().gt(new Decimal(resolution).div(2))) problems.push("changed line off target");
        }
        expect(problems).toEqual([]);
      }),
      { numRuns: 5000 },
    );
  }, TIMEOUT);

  it("normalizePercents always sums to exactly 100", () => {
    fc.assert(
      fc.property(fc.array(percentArb, { minLength: 1, maxLength: 12 }), fc.constantFrom("0.1", "1", "0.01"), (values, resolution) => {
        expect(sum(normalizePercents(values, resolution).percents).eq(100)).toBe(true);
      }),
      { numRuns: 2000 },
    );
  }, TIMEOUT);
});

/** A decimal string with at most one decimal place as a bigint count of tenths. */
function tenths(text: string): bigint {
  const [whole, fraction = ""] = text.split(".");
  if (fraction.length > 1) throw new Error(`${text} has more than one decimal`);
  return BigInt(whole!) * 10n + BigInt(fraction === "" ? 0 : fraction);
}

describe("scaleBatch properties", () => {
  const input = fc.record({
    percents: fc.array(percentArb, { minLength: 1, maxLength: 12 }).filter((ps) => ps.some((p) => Number(p) > 0)),
    totalGrams: fc.integer({ min: 1_000, max: 100_000_000 }),
    resolution: fc.constantFrom("0.1", "0.5", "1", "2", "5", "10"),
    loads: fc.option(fc.integer({ min: 1, max: 60 }), { nil: undefined }),
  });

  it("always sums to the batch mass, each load to its mass and each line across loads", () => {
    fc.assert(
      fc.property(input, ({ percents, totalGrams, resolution, loads }) => {
        const totalMassKg = new Decimal(totalGrams).div(1000).toFixed();
        // A capacity giving about `loads` loads, rounded up to whole steps.
        const capacityKg = loads === undefined ? undefined : new Decimal(totalGrams).div(loads).div(resolution).ceil().times(resolution).div(1000).toFixed();
        const result = scaleBatch(percents.map((percent) => ({ percent })), { totalMassKg, resolutionGrams: resolution, machineCapacityKg: capacityKg });
        if (!result.ok) {
          // Only a batch under half a step is refused.
          expect(new Decimal(totalGrams).lt(new Decimal(resolution).div(2))).toBe(true);
          return;
        }
        // Every mass here is a whole number of tenths of a gram: compare exactly as bigint tenths.
        const problems: string[] = [];
        const step = tenths(resolution);
        const total = tenths(result.totalMassGrams);
        const requested = 10n * BigInt(totalGrams);
        const add = (xs: readonly string[]) => xs.reduce((a, x) => a + tenths(x), 0n);
        if (2n * (total > requested ? total - requested : requested - total) > step) problems.push("batch rounded by more than half a step");
        if (add(result.lines.map((l) => l.massGrams)) !== total) problems.push("lines do not sum to the batch");
        if (add(result.loads.map((l) => l.massGrams)) !== total) problems.push("loads do not sum to the batch");
        const sizes = result.loads.map((l) => tenths(l.massGrams));
        if (sizes.reduce((a, b) => (a > b ? a : b)) - sizes.reduce((a, b) => (a < b ? a : b)) > step) problems.push("loads differ by more than a step");
        const capacity = capacityKg === undefined ? undefined : tenths(new Decimal(capacityKg).times(1000).toFixed());
        result.loads.forEach((load, j) => {
          if (add(load.lineMassesGrams) !== tenths(load.massGrams)) problems.push(`load ${j} does not sum to its mass`);
          if (capacity !== undefined && tenths(load.massGrams) > capacity) problems.push(`load ${j} over capacity`);
        });
        result.lines.forEach((line, i) => {
          if (tenths(line.massGrams) % step !== 0n) problems.push(`line ${i} off the scale's steps`);
          if (add(result.loads.map((l) => l.lineMassesGrams[i]!)) !== tenths(line.massGrams)) problems.push(`line ${i} loads do not sum`);
          if (result.loads.some((l) => tenths(l.lineMassesGrams[i]!) < 0n)) problems.push(`line ${i} negative in a load`);
        });
        expect(problems).toEqual([]);
      }),
      { numRuns: 2000 },
    );
  }, TIMEOUT);
});

describe("evaluateRecipe properties", () => {
  /** Every string and number anywhere in the output. */
  function leaves(value: unknown, out: unknown[] = []): unknown[] {
    if (Array.isArray(value)) value.forEach((v) => leaves(v, out));
    else if (typeof value === "object" && value !== null) Object.values(value).forEach((v) => leaves(v, out));
    else out.push(value);
    return out;
  }
  const garbage = fc.oneof(
    fc.constantFrom(Number.NaN, Number.POSITIVE_INFINITY, Number.NEGATIVE_INFINITY, -0, 1e308, -1e-320, "", " ", "NaN", "Infinity", "1e400", "0x1f", "1,5", null, undefined, true),
    fc.string({ maxLength: 8 }),
    fc.double(),
    fc.anything({ maxDepth: 1 }),
  );
  const value = fc.oneof(fc.integer({ min: 0, max: 100 }), percentArb, garbage);
  const ingredient = fc.oneof(
    fc.record(
      { name: fc.oneof(fc.string({ maxLength: 6 }), garbage), cocoaButter: value, cocoaSolidsNonFat: value, milkFat: value, milkSolidsNonFat: value, sugar: value, vegetableFat: value, moisture: value, inclusion: fc.oneof(fc.boolean(), garbage), pricePerKg: value },
      { requiredKeys: [] },
    ),
    garbage,
  );
  const recipe = fc.oneof(
    { weight: 8, arbitrary: fc.record({ lines: fc.array(fc.oneof(fc.record({ ingredient, percent: value }), garbage), { maxLength: 12 }) }) },
    { weight: 1, arbitrary: garbage },
  );

  it("never yields NaN or Infinity, and every figure is a plain decimal string, even on garbage", () => {
    fc.assert(
      fc.property(recipe, (input) => {
        const result = evaluateRecipe(input as Recipe);
        // Warning messages may quote the bad input ("percent NaN is not a number"): scan the rest.
        const { warnings, ...figures } = result;
        expect(warnings.every((w) => typeof w.code === "string" && typeof w.message === "string")).toBe(true);
        const bad = leaves(figures).filter(
          (leaf) => (typeof leaf === "number" && !Number.isFinite(leaf)) || (typeof leaf === "string" && /NaN|Infinity/.test(leaf)),
        );
        expect(bad).toEqual([]);
        const figureStrings = [result.composition, result.bases.eu, result.bases.codex, result.bases.us].flatMap((f) => Object.values(f));
        expect(figureStrings.filter((f) => !/^-?\d+(\.\d+)?$/.test(f))).toEqual([]);
      }),
      { numRuns: 3000 },
    );
  }, TIMEOUT);

  const fieldArb = fc.integer({ min: 0, max: 16_000 }).map((n) => new Decimal(n).div(1000).toFixed());
  const valid = fc.array(
    fc.record({ parts: fc.integer({ min: 0, max: 1000 }), cocoaButter: fieldArb, cocoaSolidsNonFat: fieldArb, milkFat: fieldArb, milkSolidsNonFat: fieldArb, sugar: fieldArb, moisture: fieldArb, inclusion: fc.boolean() }),
    { minLength: 1, maxLength: 12 },
  ).filter((lines) => lines.some((l) => l.parts > 0));

  it("splits a valid recipe summing to 100 into parts that add up to exactly 100, and US checks agree with the figures", () => {
    fc.assert(
      fc.property(valid, (spec) => {
        const percents = normalizePercents(spec.map((l) => l.parts), "0.01").percents;
        const lines = spec.map(({ parts: _p, ...fields }, i) => ({ ingredient: { name: `i${i}`, ...fields }, percent: percents[i]! }));
        const result = evaluateRecipe({ lines });
        const c = result.composition;
        // cocoa butter + non-fat cocoa solids + milk fat + non-fat milk solids + sugar + vegetable fat
        // + moisture + other + inclusions = 100 (six fields of at most 16 g never exceed 100 g per 100 g).
        const parts = [c.cocoaButter, c.cocoaSolidsNonFat, c.milkFat, c.milkSolidsNonFat, c.sugar, c.vegetableFat, c.moisture, c.other, c.inclusions];
        expect(sum(parts).eq(100)).toBe(true);
        // On the whole product (US) the figures are exact, so each check must agree with them.
        for (const s of result.standards.filter((r) => r.authority === "US")) {
          for (const check of s.checks) {
            const actual = new Decimal(check.actual);
            const expected = check.minimum !== undefined ? actual.gte(check.minimum) : check.exclusiveMaximum ? actual.lt(check.maximum!) : actual.lte(check.maximum!);
            expect(check.pass).toBe(expected);
          }
        }
      }),
      { numRuns: 2000 },
    );
  }, TIMEOUT);
});
