import type { Page } from "playwright-core";
import { describe, expect, it } from "vitest";
import { onePagePerFile } from "./page-per-file";
import { E2E_BASE_URL } from "./config";
import { CostingPage } from "./pages/costing-page";
import { signInFresh } from "./pages/sign-in-page";

let page: Page;
onePagePerFile((opened) => (page = opened));

const signInAs = (email: string) => signInFresh(page, email);

// Demo data (invented prices, db/demo/ingredients.ts and db/demo/costing.ts). House dark 70 % v3, 70 g bar:
// nibs 64 % at 16.20, cocoa butter 7.3 % at 19.80, sugar 28.3 %, lecithin 0.3 % at 6.80 GBP × 1.149,
// vanilla 0.1 % at 420 GBP × 1.149. Loss 3 %, labour 4.20/kg, overhead 2.10/kg + 0.04/bar, packaging 0.32/bar.
// Sugar from Saltmarsh: 985 GBP/t × 1.149 = 1.131765 EUR/kg → ingredients 12.639709095/kg; ÷ 0.97 × 0.07
// = 0.91214395531; + 0.294 + 0.147 + 0.04 + 0.32 = 1.71314395531 → EUR 1.713; per case of 12: EUR 20.56.
// Sugar from Tallis: 28.50 GBP / 25 kg × 1.149 = 1.30986 EUR/kg → ingredients 12.69010998/kg
// → 1.71678113258 → EUR 1.717; per case EUR 20.60.
describe("the buyer compares suppliers", () => {
  it("changes the supplier of sugar and sees the cost per bar change", async () => {
    await signInAs("priya@fenwicklane.example");
    const costing = new CostingPage(page);
    await costing.openFromList("House dark 70 %");
    expect(await costing.chosenPerBar()).toBe("EUR 1.713");
    expect(await costing.chosenBreakdownPerBar()).toBe("EUR 1.713");

    await costing.chooseSource("Sugar (sucrose)", "Tallis Fine Ingredients", "EUR 1.717");
    expect(await costing.chosenBreakdownPerBar()).toBe("EUR 1.717");
    expect(await page.getByTestId("scenario-chosen").textContent()).toContain("EUR 20.60");
    // The preferred combination does not move; the cheaper sugar stays highlighted.
    expect(await costing.preferredPerBar()).toBe("EUR 1.713");
    const sugarRow = page.getByTestId("comparison-row-Sugar (sucrose)");
    expect(await sugarRow.locator("[data-cheapest]").textContent()).toContain("EUR 1.13/kg");

    // The choice is saved: it is still there after a reload.
    await page.reload();
    expect(await costing.chosenPerBar()).toBe("EUR 1.717");

    await costing.resetToPreferred("EUR 1.713");
  });

  it("keeps costs from production until the owner shares them", async () => {
    await signInAs("joss@fenwicklane.example");
    expect(await page.getByRole("navigation", { name: "Sections" }).getByRole("link", { name: "Costing" }).count()).toBe(0);
    await page.goto(`${E2E_BASE_URL}/costing`);
    await page.getByTestId("costs-not-allowed").waitFor();
  });
});
