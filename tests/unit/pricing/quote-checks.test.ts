import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { quotesToCheck, shiftDay, type CheckedQuote } from "@/lib/pricing/quote-checks";

let n = 0;
const quote = (pair: string, validFrom: string, validUntil: string | null = null, createdAt = "2026-01-01T00:00:00Z"): CheckedQuote => {
  const [supplierId, ingredientId] = pair.split(":") as [string, string];
  n += 1;
  return { id: `q${String(n).padStart(3, "0")}`, supplierId, ingredientId, validFrom, validUntil, createdAt };
};
const on = "2026-12-01";

describe("shiftDay", () => {
  // Calendar facts (Gregorian calendar, ISO 8601 dates): 2028 is a leap year, 2026 and 2100 are not.
  it.each([
    ["2026-12-01", 30, "2026-12-31"],
    ["2026-12-01", 31, "2027-01-01"],
    ["2028-02-28", 1, "2028-02-29"],
    ["2026-02-28", 1, "2026-03-01"],
    ["2100-02-28", 1, "2100-03-01"],
    ["2026-12-01", -183, "2026-06-01"],
    ["2026-03-01", -1, "2026-02-28"],
  ])("%s moved by %i days is %s", (day, days, expected) => {
    expect(shiftDay(day, days)).toBe(expected);
  });

  it("moving forward then back returns the same day", () => {
    fc.assert(
      fc.property(fc.date({ min: new Date("1990-01-01T00:00:00Z"), max: new Date("2200-12-31T00:00:00Z"), noInvalidDate: true }), fc.integer({ min: -4000, max: 4000 }), (d, k) => {
        const day = d.toISOString().slice(0, 10);
        return shiftDay(shiftDay(day, k), -k) === day;
      }),
    );
  });
});

describe("quotesToCheck", () => {
  it("flags a current quote ending within 30 days, the 30th day included, and not one ending after", () => {
    const soon = quote("s1:sugar", "2026-06-01", "2026-12-31");
    const later = quote("s1:butter", "2026-06-01", "2027-01-01");
    const out = quotesToCheck([soon, later], { on });
    expect(out.map((c) => [c.quote.id, c.reason])).toEqual([[soon.id, "ends"]]);
  });

  it("leaves out a pair already renewed by a quote taking effect later", () => {
    const ending = quote("s1:sugar", "2026-06-01", "2026-12-15");
    const next = quote("s1:sugar", "2026-12-16");
    expect(quotesToCheck([ending, next], { on })).toEqual([]);
  });

  it("flags an open-ended quote in effect for more than about six months (183 days), not one exactly at the limit", () => {
    const old = quote("s1:lecithin", "2026-05-31");
    const atLimit = quote("s1:vanilla", "2026-06-01");
    expect(quotesToCheck([old, atLimit], { on }).map((c) => [c.quote.id, c.reason])).toEqual([[old.id, "old"]]);
  });

  it("checks only the current quote of a pair: an older superseded one does not count", () => {
    const superseded = quote("s1:milk", "2025-01-01");
    const current = quote("s1:milk", "2026-10-01");
    expect(quotesToCheck([superseded, current], { on })).toEqual([]);
  });

  it("does not list a pair whose last quote has lapsed (there is no current price to check)", () => {
    expect(quotesToCheck([quote("s1:powder", "2026-01-01", "2026-11-30")], { on })).toEqual([]);
  });

  it("treats suppliers of the same ingredient as separate pairs", () => {
    const a = quote("s1:sugar", "2026-01-10");
    const b = quote("s2:sugar", "2026-11-01");
    expect(quotesToCheck([a, b], { on }).map((c) => c.quote.id)).toEqual([a.id]);
  });

  it("lists the ending ones soonest first, then the old ones oldest first; windows can be changed", () => {
    const endsLate = quote("a:1", "2026-11-01", "2026-12-20");
    const endsSoon = quote("a:2", "2026-11-01", "2026-12-05");
    const old = quote("a:3", "2026-03-01");
    const older = quote("a:4", "2026-02-01");
    const out = quotesToCheck([endsLate, old, endsSoon, older], { on });
    expect(out.map((c) => c.quote.id)).toEqual([endsSoon.id, endsLate.id, older.id, old.id]);
    const narrow = quotesToCheck([endsLate, old, endsSoon, older], { on, endingWithinDays: 7, olderThanDays: 290 });
    expect(narrow.map((c) => c.quote.id)).toEqual([endsSoon.id, older.id]);
  });

  it("an ending quote that is also old is listed once, as ending", () => {
    const both = quote("a:1", "2025-01-01", "2026-12-10");
    expect(quotesToCheck([both], { on }).map((c) => c.reason)).toEqual(["ends"]);
  });
});
