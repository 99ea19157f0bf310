// @vitest-environment jsdom
import { cleanup, render, screen } from "@testing-library/react";
import { afterEach, describe, expect, it } from "vitest";
import { CompositionChart } from "@/components/bench/composition-chart";
import { DEFAULT_INGREDIENTS, evaluateRecipe } from "@/lib/formulation";

afterEach(cleanup);

const profile = (key: string) => {
  const found = DEFAULT_INGREDIENTS.find((d) => d.key === key);
  if (!found) throw new Error(`no reference profile ${key}`);
  return found;
};

describe("CompositionChart", () => {
  it("draws one bar per part present, as long as its share of the bar, and names them all for screen readers", () => {
    // A plain 70 % dark from the reference profiles (invented proportions).
    const { composition } = evaluateRecipe({
      lines: [
        { ingredient: profile("cocoa-nibs"), percent: "64" },
        { ingredient: profile("cocoa-butter"), percent: "6" },
        { ingredient: profile("sucrose"), percent: "30" },
      ],
    });
    render(<CompositionChart composition={composition} />);
    const chart = screen.getByRole("img");
    expect(chart.getAttribute("aria-label")).toMatch(/^The mix: Cocoa butter [\d.]+ %, Fat-free cocoa solids [\d.]+ %/);
    // No milk in a dark bar: no milk bars.
    expect(screen.queryByText("Milk fat")).toBeNull();
    expect(screen.queryByText("Non-fat milk solids")).toBeNull();
    const bar = (label: string) => (screen.getByText(label).nextElementSibling!.firstElementChild as HTMLElement).style.width;
    expect(bar("Cocoa butter")).toBe(`${Number(composition.cocoaButter)}%`);
    expect(bar("Sugar")).toBe(`${Number(composition.sugar)}%`);
    // Sucrose is nearly all sugar: close to its 30 % of the mix.
    expect(Number(composition.sugar)).toBeGreaterThan(29.5);
    expect(Number(composition.sugar)).toBeLessThanOrEqual(30);
  });
});
