import type { BrowserContext, Page } from "playwright-core";
import { afterAll, beforeAll } from "vitest";
import { launchBrowser } from "./browser";

/**
 * For a browser test file that drives one page: opens a fresh browser (its own
 * profile) before the file's tests and closes it after them. Call at the top
 * level: `let page: Page; onePagePerFile((opened) => (page = opened));`
 */
export function onePagePerFile(onOpen: (page: Page) => void): void {
  let context: BrowserContext | undefined;
  beforeAll(async () => {
    context = await launchBrowser();
    onOpen(context.pages()[0] ?? (await context.newPage()));
  });
  afterAll(async () => {
    await context?.close();
  });
}
