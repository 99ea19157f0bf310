import type { BrowserContext, Page } from "playwright-core";
import { afterAll, beforeAll, beforeEach, describe, expect, it } from "vitest";
import { DEMO_PEOPLE, DEMO_WORKSPACE } from "@/db/seed";
import { launchBrowser } from "./browser";
import { E2E_BASE_URL } from "./config";
import { SignInPage } from "./pages/sign-in-page";

let context: BrowserContext;
let page: Page;

beforeAll(async () => {
  context = await launchBrowser();
});
afterAll(async () => {
  await context?.close();
});
beforeEach(async () => {
  await context.clearCookies();
  page = context.pages()[0] ?? (await context.newPage());
});

describe("the signed-out landing page", () => {
  it("states what Barwright does and offers sign-in", async () => {
    await page.goto(E2E_BASE_URL);
    await expect(page.getByRole("heading", { level: 1 }).textContent()).resolves.toMatch(/bean lot to bar label/);
    expect(await page.getByText("Tune a recipe and know what is in it").count()).toBe(1);
    expect(await page.getByRole("link", { name: "Sign in to your workspace" }).getAttribute("href")).toBe("/sign-in");
    expect(await page.getByRole("link", { name: "Sign in", exact: true }).getAttribute("href")).toBe("/sign-in");
  });
});

describe("the signed-in shell", () => {
  it("sends a signed-out visitor to sign-in", async () => {
    await page.goto(`${E2E_BASE_URL}/overview`);
    expect(new URL(page.url()).pathname).toBe("/sign-in");
  });

  it("refuses a wrong password with a clear message", async () => {
    const signIn = new SignInPage(page);
    await signIn.open();
    await signIn.signIn(DEMO_PEOPLE[0]!.email, "not-the-password");
    await expect(signIn.formError().textContent()).resolves.toMatch(/do not match an account/);
    expect(new URL(page.url()).pathname).toBe("/sign-in");
  });

  it("shows an invalid e-mail as a field error, not a crash", async () => {
    const signIn = new SignInPage(page);
    await signIn.open();
    await signIn.signIn("not-an-email", "x");
    await expect(page.getByText("Enter a valid e-mail address, like name@example.com.").textContent()).resolves.toBeTruthy();
  });

  it("signs the owner in to the demo workspace, lists its people, and signs out", async () => {
    const signIn = new SignInPage(page);
    await signIn.open();
    await signIn.signIn(DEMO_PEOPLE[0]!.email);
    await page.waitForURL(`${E2E_BASE_URL}/overview`);
    // At a laptop's 1280 px every section fits the bar: none is cut off or hidden behind a scroll.
    const nav = page.getByRole("navigation", { name: "Sections" });
    expect(await nav.getByRole("link").count()).toBeGreaterThanOrEqual(9);
    const [scrollWidth, clientWidth] = await nav.evaluate((el) => [el.scrollWidth, el.clientWidth]);
    expect(scrollWidth).toBeLessThanOrEqual(clientWidth);
    // The account menu names the workspace and the role in it.
    await page.getByRole("button", { name: /Account menu/ }).click();
    expect(await page.getByTestId("account-menu-workspace").textContent()).toBe(DEMO_WORKSPACE.name);
    await page.keyboard.press("Escape");
    for (const person of DEMO_PEOPLE) {
      expect(await page.getByRole("cell", { name: person.name }).count()).toBe(1);
    }
    // Back on the public landing page, the header leads into the workspace instead of offering sign-in again.
    await page.goto(E2E_BASE_URL);
    expect(await page.getByRole("link", { name: `Open ${DEMO_WORKSPACE.name}` }).getAttribute("href")).toBe("/overview");
    expect(await page.getByRole("link", { name: "Sign in", exact: true }).count()).toBe(0);
    await page.goto(`${E2E_BASE_URL}/overview`);
    const cookie = (await context.cookies()).find((c) => c.name === "barwright_session");
    expect(cookie?.httpOnly).toBe(true);
    expect(cookie?.sameSite).toBe("Lax");

    await page.getByRole("button", { name: /Account menu/ }).click();
    await page.getByRole("menuitem", { name: "Sign out" }).click();
    await page.waitForURL(`${E2E_BASE_URL}/sign-in`);
    await page.goto(`${E2E_BASE_URL}/overview`);
    expect(new URL(page.url()).pathname).toBe("/sign-in");
  });
});

describe("GET /api/health on the production server", () => {
  it("reports the database up", async () => {
    const res = await fetch(`${E2E_BASE_URL}/api/health`);
    expect(res.status).toBe(200);
    expect(await res.json()).toEqual({ status: "ok", database: "up" });
  });
});
