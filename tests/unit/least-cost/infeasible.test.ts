import { beforeAll, describe, expect, it } from "vitest";
import { solveLeastCost, type LeastCostProblem, type LpSolver } from "@/lib/formulation";
import { COCOA_BUTTER, NIBS, SUGAR, line, solver } from "./fixtures";

let highs: LpSolver;
beforeAll(async () => {
  highs = await solver();
});

function explain(problem: LeastCostProblem) {
  const result = solveLeastCost(highs, problem);
  if (result.ok || result.kind !== "infeasible") throw new Error(`expected infeasible, got ${JSON.stringify(result).slice(0, 200)}`);
  return { ids: result.conflict.map((c) => c.id), message: result.message };
}

const SEVENTY = { quantity: "totalDryCocoaSolids" as const, basis: "eu" as const, value: 70 };

describe("solveLeastCost explains infeasible problems", () => {
  it("names a target and a line maximum that cannot both hold", () => {
    // Nibs hold 98 % dry cocoa solids: at most 25 % nibs gives at most 24.5 % < 70 %.
    const { ids, message } = explain({ lines: [line(NIBS, 60, { max: 25 }), line(SUGAR, 40)], limits: [SEVENTY] });
    expect(ids).toEqual(["line-max:0", "target:0"]);
    expect(message).toBe("At most 25 % Cocoa nibs and total dry cocoa solids at 70 % (EU basis) cannot both hold with these ingredients.");
  });

  it("names all three when three constraints are needed for the conflict", () => {
    // 0.98 × 25 + 30 = 54.5 < 70: with more butter or more nibs it would work.
    const { ids, message } = explain({
      lines: [line(NIBS, 40, { max: 25 }), line(COCOA_BUTTER, 30, { max: 30 }), line(SUGAR, 30)],
      limits: [SEVENTY],
    });
    expect(ids).toEqual(["line-max:0", "line-max:1", "target:0"]);
    expect(message).toContain("cannot all hold with these ingredients.");
  });

  it("leaves out constraints that take no part in the conflict", () => {
    // At most 25 % nibs gives at most 0.43 × 25 = 10.75 % dry non-fat cocoa solids, short of the
    // 14 % EU chocolate needs (Directive 2000/36/EC Annex I A.3(a)). The 70 % target and the
    // sugar minimum could both be met (butter fills the gap), so they are not named.
    const { ids, message } = explain({
      lines: [line(NIBS, 60, { max: 25 }), line(COCOA_BUTTER, 10), line(SUGAR, 30, { min: 20 })],
      limits: [SEVENTY],
      categories: [{ authority: "EU", category: "chocolate" }],
    });
    expect(ids).toEqual(["line-max:0", "standard:EU:chocolate:2"]);
    expect(message).toBe("At most 25 % Cocoa nibs and EU chocolate: dry non-fat cocoa solids ≥ 14 % cannot both hold with these ingredients.");
  });

  it("names a single standards limit the ingredients can never meet", () => {
    // Butter and sugar carry no non-fat cocoa solids: EU chocolate needs ≥ 14 % (Annex I A.3(a)).
    const { ids, message } = explain({
      lines: [line(COCOA_BUTTER, 40), line(SUGAR, 60)],
      categories: [{ authority: "EU", category: "chocolate" }],
    });
    expect(ids).toEqual(["standard:EU:chocolate:2"]);
    expect(message).toBe("EU chocolate: dry non-fat cocoa solids ≥ 14 % cannot hold with these ingredients.");
  });

  it("names a lock and a minimum that leave no room", () => {
    const { ids, message } = explain({ lines: [line(COCOA_BUTTER, 40, { locked: true }), line(SUGAR, 60, { min: 70 })] });
    expect(ids).toEqual(["lock:0", "line-min:1"]);
    expect(message).toBe("Cocoa butter locked at 40 % and at least 70 % Sugar cannot both hold with these ingredients.");
  });

  it("names a minimum above a maximum on the same line", () => {
    const { message } = explain({ lines: [line(NIBS, 70), line(SUGAR, 30, { min: 30, max: 20 })] });
    expect(message).toBe("At least 30 % Sugar and at most 20 % Sugar cannot both hold with these ingredients.");
  });
});

describe("solveLeastCost refuses what it cannot price or read", () => {
  it("asks for a price on every line that may take mass", () => {
    const result = solveLeastCost(highs, { lines: [line(NIBS, 60), line({ name: "Vanilla" }, 40)] });
    expect(result).toMatchObject({ ok: false, kind: "invalid" });
    expect(!result.ok && result.message).toBe("Vanilla has no price per kg: add a quote, or set its maximum to 0 %.");
  });

  it("accepts an unpriced line held at 0 %", () => {
    const result = solveLeastCost(highs, { lines: [line(NIBS, 60), line(SUGAR, 40), line({ name: "Vanilla" }, 0, { max: 0 })] });
    expect(result.ok).toBe(true);
  });

  it("needs at least one line", () => {
    expect(solveLeastCost(highs, { lines: [] })).toMatchObject({ ok: false, kind: "invalid", message: "Add at least one ingredient line first." });
  });

  it("ignores unknown categories and quantities with a note", () => {
    const result = solveLeastCost(highs, {
      lines: [line(NIBS, 60), line(SUGAR, 40)],
      categories: [{ authority: "EU", category: "nougat" }],
      limits: [{ quantity: "cocoaness" as never, min: 3 }],
    });
    expect(result.ok).toBe(true);
    expect(result.notes.join(" ")).toContain('"nougat" is not a standards category');
    expect(result.notes.join(" ")).toContain("is not a composition quantity");
  });
});
