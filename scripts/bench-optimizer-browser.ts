/**
 * The chromium half of the optimizer benchmark: drives the least-cost panel of the production
 * bench like a formulator (every category of the type ticked, the case's target, bounds and
 * locks), presses "Find least-cost mix" again and again, and reads the panel's own User Timing
 * entries ("least-cost:solve", around toProblem + solveLeastCost in the page's HiGHS build).
 */
import type { Page } from "playwright-core";
import type { BenchCase } from "./bench-optimizer-problems";
import { ROUNDS, WARM_UP, type Timing } from "./bench-optimizer-timing";

const solves = (page: Page) => page.evaluate(() => performance.getEntriesByName("least-cost:solve").length);

async function press(page: Page): Promise<void> {
  const before = await solves(page);
  await page.getByTestId("least-cost-panel").getByRole("button", { name: "Find least-cost mix" }).click();
  await page.waitForFunction((n) => performance.getEntriesByName("least-cost:solve").length > n, before, { timeout: 10_000 });
}

/** Opens the case's recipe and sets the panel as the case says. */
async function setUp(page: Page, base: string, recipeId: string, c: BenchCase): Promise<void> {
  await page.goto(`${base}/recipes/${recipeId}`);
  // The panel loads when it scrolls near the viewport (components/ui/once-visible.tsx).
  await page.getByTestId("least-cost-slot").scrollIntoViewIfNeeded();
  const panel = page.getByTestId("least-cost-panel");
  const find = panel.getByRole("button", { name: "Find least-cost mix" });
  await find.waitFor();
  await page.waitForFunction((el) => !(el as HTMLButtonElement).disabled, await find.elementHandle(), { timeout: 60_000 });
  for (const l of c.lines) if (l.locked) await page.getByRole("button", { name: `Lock ${l.spec.name}`, exact: true }).click();
  for (const box of await panel.getByRole("checkbox").all()) await box.check();
  await panel.getByRole("combobox", { name: "Cocoa target" }).click();
  await page.getByRole("option", { name: c.targetMode === "exactly" ? "Exactly" : "At least", exact: true }).click();
  await panel.locator("#least-cost-target").fill(c.target);
  for (const l of c.lines) {
    if (l.min) await panel.getByLabel(`Minimum for ${l.spec.name}`, { exact: true }).fill(l.min);
    if (l.max) await panel.getByLabel(`Maximum for ${l.spec.name}`, { exact: true }).fill(l.max);
  }
}

/** The first solve, the median of ROUNDS after WARM_UP more (as in Node), and the proposal as shown. */
export async function medianInPanel(page: Page, base: string, recipeId: string, c: BenchCase): Promise<Timing & { proposed: string[] }> {
  await setUp(page, base, recipeId, c);
  await press(page);
  const first = await page.evaluate(() => performance.getEntriesByName("least-cost:solve")[0]!.duration);
  for (let i = 0; i < WARM_UP; i++) await press(page);
  await page.evaluate(() => performance.clearMeasures("least-cost:solve"));
  for (let i = 0; i < ROUNDS; i++) await press(page);
  const times = await page.evaluate(() => performance.getEntriesByName("least-cost:solve").map((e) => e.duration));
  times.sort((a, b) => a - b);
  const proposal = page.getByTestId("least-cost-proposal");
  const ok = (await proposal.count()) === 1;
  const proposed = ok ? await proposal.locator("tbody tr td:nth-child(3)").allTextContents() : [];
  return { first, median: times[Math.floor(times.length / 2)]!, ok, proposed };
}
