import { describe, expect, it } from "vitest";
import { normalizePercents, rebalance } from "@/lib/formulation";

// The slider rule of issue 3: the changed line takes the new value, unlocked others absorb the
// difference in proportion to their shares, locked lines never move, the sum is exactly 100 on
// a 0.1 % grid (our default), by largest remainder. Every expected value is worked by hand.

const DARK = [
  { name: "nibs", percent: 60 },
  { name: "cocoa butter", percent: 10 },
  { name: "sugar", percent: "29.5" },
  { name: "lecithin", percent: "0.5" },
];
const percents = (result: { lines: { percent: string }[] }) => result.lines.map((l) => l.percent);

describe("rebalance", () => {
  it("shares the difference in proportion, by largest remainder on the 0.1 % grid", () => {
    // nibs 60 → 65: the others shrink from 40 to 35, ×35/40: butter 8.75, sugar 25.8125, lecithin
    // 0.4375. In 0.1 steps: 87.5, 258.125, 4.375 → floors 87, 258, 4 = 349 of 350; the one step
    // left goes to the largest remainder (.5, butter): 8.8, 25.8, 0.4.
    const result = rebalance(DARK, 0, 65);
    expect(percents(result)).toEqual(["65", "8.8", "25.8", "0.4"]);
    expect(result).toMatchObject({ applied: "65", clamped: false });
    expect(result.message).toBeUndefined();
    expect(result.lines[1]).toEqual({ name: "cocoa butter", percent: "8.8" });
  });

  it("never moves a locked line", () => {
    // lecithin locked at 0.5: butter and sugar share 34.5 as 10 : 29.5 → 8.734… and 25.765… →
    // 87.34 and 257.65 steps → floors 87 + 257 = 344 of 345; the step goes to sugar (.65 > .34).
    const result = rebalance(DARK, 0, 65, { locked: [false, false, false, true] });
    expect(percents(result)).toEqual(["65", "8.7", "25.8", "0.5"]);
  });

  it("clamps to what the locked lines leave and says so", () => {
    // butter and lecithin locked (10.5): nibs can reach at most 89.5; sugar goes to 0.
    const result = rebalance(DARK, 0, 120, { locked: [false, true, false, true] });
    expect(percents(result)).toEqual(["89.5", "10", "0", "0.5"]);
    expect(result).toMatchObject({ applied: "89.5", clamped: true });
    expect(result.message).toContain("limited to 89.5 %");
  });

  it("clamps negative requests to 0 and respects min and max", () => {
    expect(rebalance(DARK, 3, -2)).toMatchObject({ applied: "0", clamped: true });
    expect(rebalance(DARK, 0, 90, { max: 75 })).toMatchObject({ applied: "75", clamped: true });
    expect(rebalance(DARK, 3, 0, { min: "0.2" })).toMatchObject({ applied: "0.2", clamped: true });
  });

  it("refuses to move a locked line", () => {
    const result = rebalance(DARK, 1, 50, { locked: [false, true] });
    expect(percents(result)).toEqual(["60", "10", "29.5", "0.5"]);
    expect(result.clamped).toBe(true);
    expect(result.message).toContain("locked");
  });

  it("snaps to the grid and splits ties to the earlier line", () => {
    // 33 + 33 + 33 = 99 (said in the message); 33.34 → 33.3; the two others share 66.7 equally,
    // 33.35 each → 333.5 steps each: the first gets the extra step.
    const result = rebalance([{ percent: 33 }, { percent: 33 }, { percent: 33 }], 0, "33.34");
    expect(percents(result)).toEqual(["33.3", "33.4", "33.3"]);
    expect(result.message).toBe("The lines added up to 99 %; they now add up to 100 %.");
  });

  it("shares equally when every other line is 0", () => {
    // 100 − 40 = 60 over three zero lines: 20 each.
    expect(percents(rebalance([{ percent: 100 }, { percent: 0 }, { percent: 0 }, { percent: 0 }], 0, 40))).toEqual(["40", "20", "20", "20"]);
  });

  it("works at a coarser or finer resolution", () => {
    // 1 % grid: 65 → others 35 × (10, 29.5, 0.5)/40 = 8.75, 25.8125, 0.4375 → 8, 25, 0 = 33; +1 to
    // 0.75 (butter) and +1 to 0.8125 (sugar): 9, 26, 0.
    expect(percents(rebalance(DARK, 0, 65, { resolution: 1 }))).toEqual(["65", "9", "26", "0"]);
    // 0.01 grid: 8.75, 25.8125 → 2581.25 steps, 0.4375 → 43.75 steps; floors 875 + 2581 + 43 = 3499;
    // the step goes to lecithin (.75 > .25).
    expect(percents(rebalance(DARK, 0, 65, { resolution: "0.01" }))).toEqual(["65", "8.75", "25.81", "0.44"]);
  });

  it("falls back to 0.1 % for a resolution that does not divide 100", () => {
    const result = rebalance(DARK, 0, 65, { resolution: "0.3" });
    expect(percents(result)).toEqual(["65", "8.8", "25.8", "0.4"]);
    expect(result.message).toContain("divide 100");
  });

  it("lets the only unlocked line fill what is left", () => {
    const result = rebalance([{ percent: 70 }, { percent: 30 }], 0, 50, { locked: [false, true] });
    expect(percents(result)).toEqual(["70", "30"]);
    expect(result.clamped).toBe(true);
  });

  it("keeps locked lines that are off the grid and puts the residue on one line", () => {
    // locked 12.345: the free lines share 87.655 − 20 = 67.655; the sub-step 0.005 stays on one line.
    const result = rebalance([{ percent: "12.345" }, { percent: 50 }, { percent: "37.655" }], 1, 20, { locked: [true] });
    expect(percents(result)).toEqual(["12.345", "20", "67.655"]);
    expect(result.message).toContain("off the grid");
  });

  it("counts non-numbers as 0 and says so, never throwing", () => {
    const result = rebalance([{ percent: "abc" }, { percent: 50 }, { percent: Number.NaN }], 1, 20);
    // 80 over two zero lines: 40 each.
    expect(percents(result)).toEqual(["40", "20", "40"]);
    expect(result.message).toContain("not a number");
    expect(rebalance([], 0, 10)).toMatchObject({ lines: [], applied: "0" });
  });
});

describe("normalizePercents", () => {
  it("scales any parts to exactly 100", () => {
    // 1 : 1 : 1 → 33.33… each → 333 steps each, the 1000th step to the first line.
    expect(normalizePercents([1, 1, 1]).percents).toEqual(["33.4", "33.3", "33.3"]);
    // 60 : 10 : 30 sum 100 already → unchanged.
    expect(normalizePercents([60, 10, 30]).percents).toEqual(["60", "10", "30"]);
    // 2 : 1 at 1 % → 66.67, 33.33 → 66, 33 + the step to .67 → 67, 33.
    expect(normalizePercents([2, 1], 1).percents).toEqual(["67", "33"]);
    expect(normalizePercents([0, 0]).percents).toEqual(["50", "50"]);
  });
});
