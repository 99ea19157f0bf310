import { describe, expect, it } from "vitest";
import { DEFAULT_INGREDIENTS, evaluateRecipe, type RecipeLine } from "@/lib/formulation";
import { STARTING_POINTS } from "@/lib/recipes/starting-points";

const profile = (key: string) => DEFAULT_INGREDIENTS.find((p) => p.key === key)!;
const linesOf = (key: string): RecipeLine[] =>
  STARTING_POINTS.find((p) => p.key === key)!.lines.map((l) => ({ ingredient: profile(l.referenceKey), percent: l.percent }));

describe("our starting points", () => {
  it("each add up to exactly 100 % and name only reference ingredients", () => {
    for (const point of STARTING_POINTS) {
      expect(point.lines.reduce((sum, l) => sum + Number(l.percent) * 10, 0)).toBe(1000);
      for (const l of point.lines) expect(profile(l.referenceKey), l.referenceKey).toBeDefined();
    }
  });

  it("give the classic dark 70 % dry cocoa solids and make it chocolate under the EU, US and Codex", () => {
    const e = evaluateRecipe({ lines: linesOf("classic-dark-70") });
    // 64 × (55 + 43) / 100 + 7.3 = 70.02 (nibs: 55 % cocoa butter, 2 % water, common practice).
    expect(e.composition.totalDryCocoaSolids).toBe("70.02");
    expect(e.composition.cocoaSolidsStatement).toBe("70");
    const passes = e.standards.filter((s) => s.pass).map((s) => `${s.authority} ${s.category}`);
    // Directive 2000/36/EC Annex I A.3(a); 21 CFR 163.123(a)(3); Codex CXS 87-1981 2.1.1.
    expect(passes).toEqual(expect.arrayContaining(["EU chocolate", "US semisweet chocolate", "Codex chocolate"]));
  });

  it("make the milk 40 % a milk chocolate and the white 33 % a white chocolate", () => {
    const milk = evaluateRecipe({ lines: linesOf("milk-40") });
    expect(milk.composition.totalDryCocoaSolids).toBe("40.44");
    // Directive 2000/36/EC Annex I A.4(a); 21 CFR 163.130.
    expect(milk.standards.filter((s) => s.pass && s.category === "milk chocolate").map((s) => s.authority)).toEqual(expect.arrayContaining(["EU", "US"]));
    const white = evaluateRecipe({ lines: linesOf("white-33") });
    expect(white.composition.cocoaButter).toBe("33");
    // Directive 2000/36/EC Annex I A.6; 21 CFR 163.124; Codex CXS 87-1981 2.1.8.
    expect(white.standards.filter((s) => s.category === "white chocolate").every((s) => s.pass)).toBe(true);
  });
});
