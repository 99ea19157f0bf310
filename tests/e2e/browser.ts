import { mkdtempSync, rmSync } from "node:fs";
import { tmpdir } from "node:os";
import path from "node:path";
import { chromium, type BrowserContext, type Page } from "playwright-core";

/** Debian's chromium, driven by playwright-core; no browser is ever downloaded. */
export const CHROMIUM_PATH = process.env.BARWRIGHT_CHROMIUM ?? "/usr/bin/chromium";

/** Flags for a closed network and a root user (see DEVELOPERS.md). */
export const CHROMIUM_ARGS = [
  "--headless",
  "--no-sandbox",
  "--disable-gpu",
  "--disable-quic",
  "--no-first-run",
  "--disable-background-networking",
  "--disable-component-update",
  "--disable-sync",
];

/** A fresh browser profile per call, so no cookie leaks between tests; removed when the context closes. */
export async function launchBrowser(): Promise<BrowserContext> {
  const profile = mkdtempSync(path.join(tmpdir(), "barwright-e2e-"));
  const context = await chromium.launchPersistentContext(profile, {
    executablePath: CHROMIUM_PATH,
    args: CHROMIUM_ARGS,
    viewport: { width: 1280, height: 900 },
  });
  for (const page of context.pages()) settleAfterGoto(page);
  context.on("page", settleAfterGoto);
  context.on("close", () => {
    // Chromium may still be writing its last files as the context closes: retry, and leave the folder rather than fail a test.
    try {
      rmSync(profile, { recursive: true, force: true, maxRetries: 10, retryDelay: 100 });
    } catch {
      /* a leftover folder in the system's temporary directory is harmless */
    }
  });
  return context;
}

/**
 * React streams a page's content into a hidden segment (`<div hidden id="S:0">`) and
 * reveals it a moment later, batched on an animation frame; Playwright's "load" can come
 * in between, and while React swaps the segment in, the same test ids may exist twice
 * (a strict-mode error in a locator). So every `page.goto`, `page.reload` and
 * `page.waitForURL` of our contexts (the last covers a link or a GET form that loads a
 * new document) returns only once no hidden segment is left (bounded: 10 s, then the
 * test's own waits decide).
 */
function settleAfterGoto(page: Page): void {
  const settled = () => page.waitForFunction(() => !document.querySelector('div[hidden][id^="S:"]'), undefined, { timeout: 10_000 }).catch(() => undefined);
  const goto = page.goto.bind(page);
  page.goto = async (url, options) => {
    const response = await goto(url, options);
    await settled();
    return response;
  };
  const reload = page.reload.bind(page);
  page.reload = async (options) => {
    const response = await reload(options);
    await settled();
    return response;
  };
  const waitForURL = page.waitForURL.bind(page);
  page.waitForURL = async (url, options) => {
    await waitForURL(url, options);
    await settled();
  };
}
