import { mkdtempSync, rmSync } from "node:fs";
import { tmpdir } from "node:os";
import path from "node:path";
import { chromium, type BrowserContext } from "playwright-core";

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
