import type { Page } from "playwright-core";
import { describe, expect, it } from "vitest";
import { E2E_BASE_URL } from "./config";
import { onePagePerFile } from "./page-per-file";
import { signInFresh } from "./pages/sign-in-page";

let page: Page;
onePagePerFile((opened) => (page = opened));

/** Visible copies only: a streamed page may hold a hidden duplicate for a moment. */
const visible = (testId: string) => page.locator(`[data-testid="${testId}"]:visible`);

// The demo's recipes, prices and targets are invented (db/demo/*.ts); the figures are checked against the Costing page.
describe("the overview", () => {
  it("shows the owner each released bar's cost and margin, the same cost the bar's Costing page gives", async () => {
    await signInFresh(page, "mara@fenwicklane.example");
    await page.goto(`${E2E_BASE_URL}/overview`);
    const margins = visible("overview-margins");
    await margins.waitFor();
    for (const card of ["overview-production", "overview-beans", "overview-unreleased", "overview-quotes"]) await visible(card).waitFor();
    const row = margins.getByRole("row").filter({ hasText: "House dark 70 %" });
    const costCell = row.getByRole("cell").nth(1);
    const cost = (await costCell.textContent())?.trim();
    expect(cost).toMatch(/^EUR \d+\.\d{3}$/);
    expect(await row.getByTestId("wholesale-margin").textContent()).toMatch(/\d+\.\d %/);
    await row.getByRole("link", { name: "House dark 70 %" }).click();
    await page.waitForURL(/\/costing\/[0-9a-f-]{36}\?version=\d+$/);
    await page.locator('[data-testid="scenario-chosen-per-bar"]:visible').waitFor();
    expect((await page.locator('[data-testid="scenario-chosen-per-bar"]:visible').textContent())?.trim()).toBe(cost);
  });

  it("fits a phone's width: wide tables scroll inside their cards, the page itself does not scroll sideways", async () => {
    await page.setViewportSize({ width: 390, height: 844 });
    const fits = async (path: string) => {
      await page.goto(`${E2E_BASE_URL}${path}`);
      await page.locator("main h1:visible").first().waitFor();
      await page.waitForLoadState("load");
      const { scroll, client } = await page.evaluate(() => ({ scroll: document.documentElement.scrollWidth, client: document.documentElement.clientWidth }));
      expect({ path, scroll }).toEqual({ path, scroll: client });
    };
    try {
      await page.goto(`${E2E_BASE_URL}/recipes`);
      await page.getByRole("link", { name: "House dark 70 %" }).first().click();
      await page.waitForURL(/\/recipes\/[0-9a-f-]{36}$/);
      const recipe = new URL(page.url()).pathname;
      await page.goto(`${E2E_BASE_URL}/lots`);
      await page.getByRole("link", { name: "EC-2026-07", exact: true }).click();
      await page.waitForURL(/\/lots\/[0-9a-f-]{36}$/);
      const lot = new URL(page.url()).pathname;
      // Pages whose grids or tables once made a 390 px page wider than the screen.
      for (const path of ["/overview", recipe, `${recipe}/compare`, lot, recipe.replace("/recipes/", "/costing/"), "/batches/new"]) await fits(path);
    } finally {
      await page.setViewportSize({ width: 1280, height: 900 });
    }
  });

  it("gives the buyer the prices to check, on the overview and in full on the Prices page", async () => {
    await signInFresh(page, "priya@fenwicklane.example");
    await page.goto(`${E2E_BASE_URL}/overview`);
    // The demo's Holloway skim milk powder quote took effect on 2026-02-01 (invented), over six months ago.
    await visible("overview-quotes").getByText("Skim milk powder").waitFor();
    await page.goto(`${E2E_BASE_URL}/prices#to-check`);
    const card = visible("prices-to-check");
    await card.waitFor();
    const row = card.getByRole("row").filter({ hasText: "Skim milk powder" });
    expect(await row.textContent()).toContain("Holloway Dairy Powders");
    expect(await row.textContent()).toContain("over six months old");
    expect(await visible("overview-quotes").count()).toBe(0);
  });

  it("lists planned batches with a link to the batch sheet, and leaves margins and prices out for production", async () => {
    await signInFresh(page, "joss@fenwicklane.example");
    await page.goto(`${E2E_BASE_URL}/overview`);
    const production = visible("overview-production");
    await production.waitFor();
    expect(await visible("overview-margins").count()).toBe(0);
    expect(await visible("overview-quotes").count()).toBe(0);
    expect(await visible("overview-unreleased").count()).toBe(0);
    const batch = production.getByRole("link", { name: /^B-\d{4}-\d{4}$/ }).first();
    const code = await batch.textContent();
    await batch.click();
    await page.waitForURL(/\/batches\/[0-9a-f-]{36}$/);
    expect(await page.locator('[data-testid="batch-code"]:visible').textContent()).toBe(code);
  });
});
