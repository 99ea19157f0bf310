import { randomBytes } from "node:crypto";
import type { BrowserContext, Page } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { DEMO_PEOPLE } from "@/db/seed";
import { launchBrowser } from "./browser";
import { E2E_BASE_URL } from "./config";
import { BenchPage } from "./pages/bench-page";
import { SignInPage } from "./pages/sign-in-page";

let theoContext: BrowserContext;
let maraContext: BrowserContext;

const theo = DEMO_PEOPLE.find((p) => p.role === "formulator")!;
const mara = DEMO_PEOPLE.find((p) => p.role === "owner")!;

async function signedIn(context: BrowserContext, email: string): Promise<Page> {
  const page = context.pages()[0] ?? (await context.newPage());
  const signIn = new SignInPage(page);
  await signIn.open();
  await signIn.signIn(email);
  await page.waitForURL(`${E2E_BASE_URL}/overview`);
  return page;
}

const nibs = "Cocoa nibs (roasted)";
const sugar = "Sugar (sucrose)";
const butter = "Cocoa butter";

beforeAll(async () => {
  theoContext = await launchBrowser();
  maraContext = await launchBrowser();
});
afterAll(async () => {
  await theoContext?.close();
  await maraContext?.close();
});

describe("the recipe bench in the browser", () => {
  it("drags a slider keeping 100 %, saves, survives a reload, resolves a conflict with a second editor, and compares versions", async () => {
    // Theo starts a recipe from the classic dark starting point.
    const page = await signedIn(theoContext, theo.email);
    await page.goto(`${E2E_BASE_URL}/recipes/new`);
    const name = `Bench trial ${randomBytes(3).toString("hex")}`;
    await page.getByLabel("Name").fill(name);
    await page.getByRole("button", { name: "Create and open the bench" }).click();
    await page.waitForURL(/\/recipes\/[0-9a-f-]{36}$/);
    const bench = new BenchPage(page);
    await page.getByTestId("composition-panel").waitFor();
    const recipeId = bench.recipeId();
    expect(await bench.exact(nibs)).toBe("64.0");
    expect(await bench.figure("totalDryCocoaSolids")).toBe("70.0 %");

    // Dragging the nibs slider to the right with the mouse moves the figures and keeps the total at 100 %.
    await bench.drag(nibs, 40);
    const dragged = Number(await bench.exact(nibs));
    expect(dragged).toBeGreaterThan(64);
    expect(await bench.total()).toBe("100.0 %");
    expect(await bench.figure("totalDryCocoaSolids")).not.toBe("70.0 %");
    await bench.save("Dragged the nibs up");
    await bench.waitForSaved(2);

    // Mara, in another browser, saves v3 from v2.
    const maraPage = await signedIn(maraContext, mara.email);
    const maraBench = new BenchPage(maraPage);
    await maraBench.open(recipeId);
    await maraBench.press(sugar, "ArrowRight", 5);
    expect(await maraBench.total()).toBe("100.0 %");
    await maraBench.save("More sugar");
    await maraBench.waitForSaved(3);

    // Theo, still on v2, keeps working; his draft survives a reload.
    const before = Number(await bench.exact(butter));
    await bench.press(butter, "Shift+ArrowRight");
    const mine = await bench.exact(butter);
    expect(mine).toBe((before + 1).toFixed(1));
    await page.waitForTimeout(400); // the draft is kept a quarter second after the last change
    await page.reload();
    await page.getByTestId("draft-banner").waitFor();
    expect(await bench.exact(butter)).toBe(mine);
    expect(await bench.total()).toBe("100.0 %");

    // Saving conflicts with Mara's v3: both are shown, and Theo keeps his as v4.
    await bench.save("More butter");
    await bench.conflict().waitFor();
    expect(await page.getByRole("dialog").getByRole("heading").first().textContent()).toBe("v3 was saved while you worked");
    expect(await bench.conflict().getByRole("row", { name: /Sugar \(sucrose\)/ }).count()).toBe(1);
    await page.getByRole("button", { name: "Save mine as v4" }).click();
    await bench.waitForSaved(4);
    expect(await bench.exact(butter)).toBe(mine);

    // History lists the four versions; comparing v3 with v4 shows what differs.
    await page.goto(`${E2E_BASE_URL}/recipes/${recipeId}/history`);
    await page.getByTestId("version-v4").waitFor();
    // Visible rows only: while the page streams in, React keeps a hidden copy for a moment.
    for (const v of [1, 2, 3, 4]) expect(await page.locator(`[data-testid="version-v${v}"]:visible`).count()).toBe(1);
    await page.getByLabel("Compare").selectOption("3");
    await page.getByLabel("with").selectOption("4");
    await page.getByRole("button", { name: "Compare", exact: true }).click();
    await page.waitForURL(/compare\?a=3&b=4/);
    // Visible copies only, as above: the streamed page may briefly hold a hidden duplicate.
    const butterRow = page
      .locator('[data-testid="compare-lines"]:visible')
      .getByRole("row", { name: new RegExp(`^${butter}`) });
    await butterRow.waitFor();
    expect(await butterRow.textContent()).toMatch(/\+1\.\d %/);
    await page.locator('[data-testid="diff-costPerBar"]:visible').waitFor();
  });
});

describe("the recipes for production", () => {
  it("lists released recipes only and opens their released version, never a newer one", async () => {
    const context = await launchBrowser();
    try {
      const joss = DEMO_PEOPLE.find((p) => p.role === "production")!;
      const page = await signedIn(context, joss.email);
      await page.goto(`${E2E_BASE_URL}/recipes`);
      await page.getByRole("link", { name: "House dark 70 %" }).click();
      await page.waitForURL(/\/recipes\/[0-9a-f-]{36}\/versions\/2$/);
      expect(await page.getByTestId("version-heading").textContent()).toMatch(/v2\s*released for production/);
      expect(await page.getByRole("link", { name: "History" }).count()).toBe(0);
      const recipeUrl = page.url().replace(/\/versions\/2$/, "");
      await page.goto(recipeUrl); // the bench sends production to the released version
      await page.waitForURL(/\/versions\/2$/);
      await page.goto(`${recipeUrl}/versions/3`); // v3 exists but is not released
      await page.getByRole("heading", { name: "That recipe or version is not here" }).waitFor();
      expect(await page.getByTestId("version-heading").count()).toBe(0);
    } finally {
      await context.close();
    }
  });
});
