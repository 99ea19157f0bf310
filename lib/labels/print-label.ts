import "server-only";
import { chromium } from "playwright-core";

/** Debian's chromium, as the browser tests use; BARWRIGHT_CHROMIUM to change. */
const CHROMIUM_PATH = process.env.BARWRIGHT_CHROMIUM ?? "/usr/bin/chromium";

// The flags a closed network and a root user need (as in tests/e2e/browser.ts).
const CHROMIUM_ARGS = ["--headless", "--no-sandbox", "--disable-gpu", "--disable-quic", "--no-first-run", "--disable-background-networking", "--disable-component-update", "--disable-sync"];

export type LabelFile = { format: "pdf" | "png"; paper: "a4" | "letter" };

// One print at a time per server process: a chromium takes ~150 MB and labels are printed rarely.
let queue: Promise<unknown> = Promise.resolve();

/**
 * Prints the label's print page as the user who asked (their session cookie goes along, so
 * the page makes the same permission checks): a PDF on A4 or Letter, or a PNG of the label
 * at twice the screen resolution.
 */
export function printLabel({ url, cookies, file }: { url: string; cookies: { name: string; value: string }[]; file: LabelFile }): Promise<Buffer> {
  const run = queue.then(async () => {
    const browser = await chromium.launch({ executablePath: CHROMIUM_PATH, args: CHROMIUM_ARGS });
    try {
      const context = await browser.newContext({ deviceScaleFactor: 2, viewport: { width: 900, height: 1200 } });
      await context.addCookies(cookies.map((c) => ({ ...c, url })));
      const page = await context.newPage();
      const response = await page.goto(url, { waitUntil: "load", timeout: 30_000 });
      if (!response?.ok()) throw new Error(`label print page answered ${response?.status() ?? "nothing"}`);
      // A lost session lands on the sign-in page: never print that as a label.
      if (new URL(page.url()).pathname !== new URL(url).pathname) throw new Error(`label print page moved to ${new URL(page.url()).pathname}`);
      await page.evaluate(() => document.fonts.ready.then(() => undefined));
      if (file.format === "png") return await page.locator("[data-testid=label-sheet]").screenshot({ type: "png" });
      await page.emulateMedia({ media: "print" });
      return await page.pdf({ format: file.paper === "letter" ? "Letter" : "A4", printBackground: true, preferCSSPageSize: true });
    } finally {
      await browser.close();
    }
  });
  queue = run.catch(() => undefined);
  return run;
}
