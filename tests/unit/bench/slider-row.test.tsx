// @vitest-environment jsdom
import { cleanup, fireEvent, render, screen, within } from "@testing-library/react";
import { useReducer } from "react";
import { afterEach, beforeAll, describe, expect, it } from "vitest";
import { benchReducer, initialBench } from "@/components/bench/bench-state";
import { LineList } from "@/components/bench/line-list";
import type { BenchIngredient, DraftLine } from "@/lib/recipes/types";

beforeAll(() => {
  // jsdom has no layout: Radix's slider only needs ResizeObserver to exist.
  globalThis.ResizeObserver ??= class {
    observe() {}
    unobserve() {}
    disconnect() {}
  };
});
afterEach(cleanup);

const ingredient = (id: string, name: string): BenchIngredient => ({
  id,
  name,
  kind: "other",
  archived: false,
  isInclusion: false,
  allergens: [],
  pricePerKg: null,
  cocoaButter: "0",
  cocoaSolidsNonFat: "0",
  milkFat: "0",
  milkSolidsNonFat: "0",
  sugar: "0",
  vegetableFat: "0",
  moisture: "0",
});
const library = new Map([ingredient("n", "Cocoa nibs"), ingredient("b", "Cocoa butter"), ingredient("s", "Sugar")].map((i) => [i.id, i]));
const start: DraftLine[] = [
  { ingredientId: "n", percent: "64", locked: false },
  { ingredientId: "b", percent: "8", locked: false },
  { ingredientId: "s", percent: "28", locked: false },
];

/** The real line list driven by the real bench reducer (the engine's rebalance inside). */
function Harness() {
  const [state, dispatch] = useReducer(benchReducer, initialBench({ lines: start, barMassGrams: "70" }, 1));
  return <LineList lines={state.lines} library={library} message={state.message} dispatch={dispatch} />;
}

const slider = (name: string) => screen.getByRole("slider", { name });
const exact = (name: string) => (screen.getByLabelText(`${name}, exact percent`) as HTMLInputElement).value;
const total = () => screen.getByTestId("lines-total").textContent;

describe("the bench's slider rows", () => {
  it("names every slider and gives its value as text", () => {
    render(<Harness />);
    expect(slider("Cocoa nibs").getAttribute("aria-valuetext")).toBe("64.0 %");
    expect(slider("Sugar").getAttribute("aria-valuenow")).toBe("28");
  });

  it("nudges by 0.1 % with an arrow key and by 1 % with Shift+arrow, the other lines taking up the difference", () => {
    render(<Harness />);
    fireEvent.keyDown(slider("Cocoa nibs"), { key: "ArrowRight" });
    expect(exact("Cocoa nibs")).toBe("64.1");
    // The unlocked lines give up 0.1 % in proportion: butter 8 × 0.1 / 36 → grid, sugar the rest.
    expect(Number(exact("Cocoa butter")) + Number(exact("Sugar"))).toBeCloseTo(35.9, 6);
    expect(total()).toBe("100.0 %");
    fireEvent.keyDown(slider("Cocoa nibs"), { key: "ArrowUp", shiftKey: true });
    expect(exact("Cocoa nibs")).toBe("65.1");
    fireEvent.keyDown(slider("Cocoa nibs"), { key: "ArrowLeft" });
    expect(exact("Cocoa nibs")).toBe("65.0");
    expect(total()).toBe("100.0 %");
  });

  it("goes as far as the unlocked lines allow with End, and to 0 with Home", () => {
    render(<Harness />);
    fireEvent.click(screen.getByRole("button", { name: "Lock Sugar" }));
    fireEvent.keyDown(slider("Cocoa nibs"), { key: "End" });
    expect(exact("Cocoa nibs")).toBe("72.0");
    expect(exact("Cocoa butter")).toBe("0.0");
    expect(exact("Sugar")).toBe("28.0");
    expect(screen.getByTestId("bench-message").textContent).toMatch(/limited to 72 %/);
    fireEvent.keyDown(slider("Cocoa nibs"), { key: "Home" });
    expect(exact("Cocoa nibs")).toBe("0.0");
    expect(exact("Cocoa butter")).toBe("72.0");
    expect(total()).toBe("100.0 %");
  });

  it("keeps a locked line where it is, and a locked slider cannot be moved", () => {
    render(<Harness />);
    const lock = screen.getByRole("button", { name: "Lock Cocoa butter" });
    fireEvent.click(lock);
    expect(lock.getAttribute("aria-pressed")).toBe("true");
    fireEvent.keyDown(slider("Cocoa nibs"), { key: "ArrowRight", shiftKey: true });
    expect(exact("Cocoa nibs")).toBe("65.0");
    expect(exact("Cocoa butter")).toBe("8.0");
    expect(exact("Sugar")).toBe("27.0");
    fireEvent.keyDown(slider("Cocoa butter"), { key: "ArrowRight" });
    expect(exact("Cocoa butter")).toBe("8.0");
    expect(slider("Cocoa butter").getAttribute("tabindex")).toBeNull();
  });

  it("takes an exact figure from the number field and refuses text that is not a percent", () => {
    render(<Harness />);
    const field = screen.getByLabelText("Cocoa nibs, exact percent");
    fireEvent.change(field, { target: { value: "66.5" } });
    fireEvent.keyDown(field, { key: "Enter" });
    expect(exact("Cocoa nibs")).toBe("66.5");
    expect(total()).toBe("100.0 %");
    fireEvent.change(field, { target: { value: "lots" } });
    fireEvent.blur(field);
    expect(within(screen.getByTestId("line-0")).getByRole("alert").textContent).toBe("Enter a percent from 0 to 100.");
    expect(total()).toBe("100.0 %");
  });

  it("removes a line and gives its share to the unlocked lines", () => {
    render(<Harness />);
    fireEvent.click(screen.getByRole("button", { name: "Remove Cocoa butter" }));
    expect(screen.queryByRole("slider", { name: "Cocoa butter" })).toBeNull();
    expect(total()).toBe("100.0 %");
  });
});
