import { describe, expect, it } from "vitest";
import { deltaOf, diffLines } from "@/lib/recipes/diff";

describe("comparing two versions' lines", () => {
  it("matches lines by ingredient, keeps exact deltas, and marks added and removed lines", () => {
    const a = [
      { ingredientId: "n", name: "Nibs", percent: "64.0000" },
      { ingredientId: "s", name: "Sugar", percent: "28.4000" },
      { ingredientId: "l", name: "Lecithin", percent: "0.3000" },
    ];
    const b = [
      { ingredientId: "s", name: "Sugar", percent: "28.3" },
      { ingredientId: "n", name: "Nibs", percent: "64" },
      { ingredientId: "v", name: "Vanilla", percent: "0.1" },
    ];
    const rows = diffLines(a, b);
    expect(rows.map((r) => [r.label, r.delta, r.changed])).toEqual([
      ["Nibs", "0", false],
      ["Sugar", "-0.1", true],
      ["Lecithin", null, true],
      ["Vanilla", null, true],
    ]);
    expect(rows[2]).toMatchObject({ a: "0.3000", b: null });
  });

  it("subtracts exactly, with no binary rounding", () => {
    expect(deltaOf("0.1", "0.3")).toBe("0.2");
    expect(deltaOf("1.005", null)).toBeNull();
  });
});
