import type { BrowserContext, Page } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { launchBrowser } from "./browser";
import { E2E_BASE_URL } from "./config";
import { SignInPage } from "./pages/sign-in-page";

let context: BrowserContext;
let page: Page;

beforeAll(async () => {
  context = await launchBrowser();
  page = context.pages()[0] ?? (await context.newPage());
});
afterAll(async () => {
  await context?.close();
});

async function openDemoRecipeAs(email: string) {
  await context.clearCookies();
  const signIn = new SignInPage(page);
  await signIn.open();
  await signIn.signIn(email);
  await page.waitForURL(`${E2E_BASE_URL}/overview`);
  await page.goto(`${E2E_BASE_URL}/recipes`);
  await page.getByRole("link", { name: "House dark 70 %" }).first().click();
  await page.waitForURL(/\/recipes\/[0-9a-f-]{36}$/);
}

describe("what a buyer may do with a recipe", () => {
  it("reads the bench but cannot move a line or save a version", async () => {
    await openDemoRecipeAs("priya@fenwicklane.example");
    const nibs = page.getByRole("textbox", { name: "Cocoa nibs (roasted), exact percent" });
    expect(await nibs.isDisabled()).toBe(true);
    expect(await page.getByRole("slider", { name: "Cocoa nibs (roasted)" }).getAttribute("data-disabled")).toBe("");
    expect(await page.getByRole("button", { name: /^Save as v/ }).count()).toBe(0);
  });

  it("a formulator can edit the same bench", async () => {
    await openDemoRecipeAs("theo@fenwicklane.example");
    expect(await page.getByRole("textbox", { name: "Cocoa nibs (roasted), exact percent" }).isDisabled()).toBe(false);
    expect(await page.getByRole("button", { name: /^Save as v/ }).count()).toBe(1);
  });
});
