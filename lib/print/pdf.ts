import "server-only";
import { chromium } from "playwright-core";

/** Debian's chromium (the same binary the browser tests drive); BARWRIGHT_CHROMIUM to change. */
const CHROMIUM_PATH = process.env.BARWRIGHT_CHROMIUM ?? "/usr/bin/chromium";

// The flags a closed network and a root user need (the same as tests/e2e/browser.ts).
const CHROMIUM_ARGS = [
  "--headless",
  "--no-sandbox",
  "--disable-gpu",
  "--disable-quic",
  "--no-first-run",
  "--disable-background-networking",
  "--disable-component-update",
  "--disable-sync",
];

export type Paper = "a4" | "letter";

// One print at a time per server process: a chromium takes ~150 MB, and sheets are printed rarely.
let queue: Promise<unknown> = Promise.resolve();

/**
 * Prints one of our own pages to PDF with the installed Chromium, as the
 * signed-in user who asked (their session cookie goes along, so the page
 * applies the same permission checks). The page's print CSS sets the layout;
 * `paper` picks A4 or US Letter.
 */
export function printToPdf({ url, cookies, paper }: { url: string; cookies: { name: string; value: string }[]; paper: Paper }): Promise<Buffer> {
  const run = queue.then(async () => {
    const browser = await chromium.launch({ executablePath: CHROMIUM_PATH, args: CHROMIUM_ARGS });
    try {
      const context = await browser.newContext();
      await context.addCookies(cookies.map((c) => ({ ...c, url })));
      const page = await context.newPage();
      const response = await page.goto(url, { waitUntil: "networkidle", timeout: 30_000 });
      if (!response?.ok()) throw new Error(`print page answered ${response?.status() ?? "nothing"}`);
      // A lost session lands on the sign-in page: never print that as a batch sheet.
      if (new URL(page.url()).pathname !== new URL(url).pathname) throw new Error(`print page moved to ${new URL(page.url()).pathname}`);
      await page.emulateMedia({ media: "print" });
      return await page.pdf({ format: paper === "letter" ? "Letter" : "A4", printBackground: true, margin: { top: "12mm", bottom: "12mm", left: "12mm", right: "12mm" } });
    } finally {
      await browser.close();
    }
  });
  queue = run.catch(() => undefined);
  return run;
}
