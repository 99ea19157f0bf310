import { describe, expect, it } from "vitest";
import { MAX_INPUT_DEPTH, unsafeInputProblem } from "@/lib/validation/safe-input";
import { safeReturnPath } from "@/lib/unavailable";

describe("unsafeInputProblem", () => {
  it.each([
    ["a NUL in a value", { name: "nib\u0000s" }, /NUL/],
    ["a NUL in a key", { ["na\u0000me"]: "x" }, /NUL/],
    ["a lone high surrogate", { name: "\uD800" }, /unpaired surrogate/],
    ["a lone low surrogate deep in an array", { lines: [{ note: "x\uDFFF" }] }, /unpaired surrogate/],
  ])("refuses %s", (_label, input, message) => {
    expect(unsafeInputProblem(input)).toMatch(message);
  });

  it("refuses nesting deeper than the limit without overflowing the stack", () => {
    let deep: unknown = "x";
    for (let i = 0; i < 200_000; i++) deep = [deep];
    expect(unsafeInputProblem(deep)).toMatch(/nested too deeply/);
    let ok: unknown = "x";
    for (let i = 0; i < MAX_INPUT_DEPTH; i++) ok = [ok];
    expect(unsafeInputProblem(ok)).toBeNull();
  });

  it.each([
    ["right-to-left override", "\u202Eeulb"],
    ["zero-width joiner", "co\u200Dcoa"],
    ["a surrogate pair (emoji)", "🍫"],
    ["combining accent", "Cafe\u0301"],
    ["markup", "<script>alert(1)</script>"],
  ])("lets %s through as text", (_label, text) => {
    expect(unsafeInputProblem({ name: text, lines: [text] })).toBeNull();
  });
});

describe("safeReturnPath", () => {
  it.each([
    ["/recipes?q=dark", "/recipes?q=dark"],
    [null, "/"],
    ["https://elsewhere.example/", "/"],
    ["//elsewhere.example", "/"],
    ["/\\elsewhere.example", "/"],
    ["/unavailable?from=/x", "/"],
  ])("turns %s into %s", (from, expected) => {
    expect(safeReturnPath(from)).toBe(expected);
  });
});
