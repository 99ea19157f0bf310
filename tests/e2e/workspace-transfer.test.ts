import { readFileSync, writeFileSync, mkdtempSync } from "node:fs";
import { tmpdir } from "node:os";
import path from "node:path";
import type { BrowserContext } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { DEMO_PEOPLE } from "@/db/seed";
import { launchBrowser } from "./browser";
import { E2E_BASE_URL } from "./config";
import { SignInPage } from "./pages/sign-in-page";
import { WorkspacePage } from "./pages/workspace-page";

// This file sorts last on purpose: it gives the demo owner a second workspace
// (the demo workspace itself is only read). Sign-in still opens the demo, the
// first of her workspaces by name.
const owner = DEMO_PEOPLE.find((p) => p.role === "owner")!;
let browser: BrowserContext;

beforeAll(async () => {
  browser = await launchBrowser();
});
afterAll(async () => {
  await browser?.close();
});

describe("backup and move", () => {
  it("lets the owner download the workspace, import it as a new one and open its recipes", async () => {
    const page = browser.pages()[0] ?? (await browser.newPage());
    const signIn = new SignInPage(page);
    await signIn.open();
    await signIn.signIn(owner.email);
    await page.waitForURL(`${E2E_BASE_URL}/overview`);

    const settings = new WorkspacePage(page);
    await settings.openFromMenu();
    const file = await settings.download();
    expect(file.name).toMatch(/^barwright-fenwick-lane-chocolate-works-\d{4}-\d{2}-\d{2}\.json$/);
    const doc = JSON.parse(readFileSync(file.path, "utf8")) as { format: string; tables: { recipes: { name: string }[] } };
    expect(doc.format).toBe("barwright-workspace");
    const names = doc.tables.recipes.map((r) => r.name).sort();
    expect(names).toContain("House dark 70 %");

    // A file that is not an export is refused with the reason, and nothing is made.
    const wrong = path.join(mkdtempSync(path.join(tmpdir(), "bw-wrong-")), "prices.json");
    writeFileSync(wrong, JSON.stringify({ supplier: "Saltmarsh Sugar Company" }));
    await settings.importFile(wrong);
    expect(await settings.error().innerText()).toMatch(/not a Barwright workspace export/);

    await settings.importFile(file.path);
    await settings.done().waitFor({ timeout: 30_000 });
    expect(await settings.done().innerText()).toMatch(new RegExp(`is ready: ${names.length} recipes`));
    await page.getByRole("button", { name: /^Open Fenwick Lane Chocolate Works \(imported / }).click();
    await page.waitForURL(`${E2E_BASE_URL}/recipes`);
    const rows = page.getByTestId("recipe-row").filter({ visible: true });
    await rows.first().waitFor();
    expect((await rows.allInnerTexts()).length).toBe(names.length);
    expect(await page.getByTestId("workspace-switcher").innerText()).toMatch(/\(imported /);
    // With two workspaces the switcher shares the bar, and every section still fits at 1280 px.
    const [scrollWidth, clientWidth] = await page.getByRole("navigation", { name: "Sections" }).evaluate((el) => [el.scrollWidth, el.clientWidth]);
    expect(scrollWidth).toBeLessThanOrEqual(clientWidth);
  });
});
