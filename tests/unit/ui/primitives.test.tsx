// @vitest-environment jsdom
import { cleanup, render, screen } from "@testing-library/react";
import { afterEach, describe, expect, it } from "vitest";
import { Badge } from "@/components/ui/badge";
import { Button } from "@/components/ui/button";
import { Field } from "@/components/ui/field";
import { NumberField } from "@/components/ui/number-field";

afterEach(cleanup);

describe("NumberField", () => {
  it("shows its unit and keeps the typed text as entered", () => {
    render(<NumberField aria-label="Cocoa butter" unit="%" defaultValue="8.50" />);
    const input = screen.getByLabelText("Cocoa butter") as HTMLInputElement;
    expect(input.value).toBe("8.50");
    expect(input.inputMode).toBe("decimal");
    expect(screen.getByText("%")).toBeTruthy();
  });
});

describe("Field", () => {
  it("labels its control and announces an error instead of the hint", () => {
    render(
      <Field id="mass" label="Batch mass" hint="In kilograms" error="Enter a mass above zero.">
        <input id="mass" />
      </Field>,
    );
    expect(screen.getByLabelText("Batch mass")).toBeTruthy();
    expect(screen.getByRole("alert").textContent).toBe("Enter a mass above zero.");
    expect(screen.queryByText("In kilograms")).toBeNull();
  });
});

describe("Button", () => {
  it("defaults to type=button so it never submits a form by accident", () => {
    render(<Button>Save version</Button>);
    expect(screen.getByRole("button", { name: "Save version" }).getAttribute("type")).toBe("button");
  });

  it("renders its child when asChild is set", () => {
    render(
      <Button asChild>
        <a href="#recipes">Recipes</a>
      </Button>,
    );
    expect(screen.getByRole("link", { name: "Recipes" }).getAttribute("href")).toBe("#recipes");
  });
});

describe("Badge", () => {
  it("uses the sage tone for a result that meets a standard", () => {
    render(<Badge tone="meets">meets</Badge>);
    expect(screen.getByText("meets").className).toContain("bg-sage-light");
  });
});
