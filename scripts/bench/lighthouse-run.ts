/**
 * One Lighthouse 12 performance run in Debian's Chromium, with the desktop
 * preset (simulated 40 ms RTT, 10 Mbit/s, no CPU slowdown) and an optional
 * session cookie sent with every request (Lighthouse's extraHeaders).
 */
import * as chromeLauncher from "chrome-launcher";
import lighthouse, { desktopConfig } from "lighthouse";

export type PageFigures = {
  score: number;
  lcpMs: number;
  cls: number;
  tbtMs: number;
  fcpMs: number;
  /** Scripts the page loaded: count, bytes on the wire and uncompressed. */
  scripts: { count: number; transferBytes: number; resourceBytes: number };
};

type NetworkItem = { url: string; resourceType?: string; transferSize?: number; resourceSize?: number };

export async function launchChromium(): Promise<chromeLauncher.LaunchedChrome> {
  return chromeLauncher.launch({
    chromePath: process.env.BARWRIGHT_CHROMIUM ?? "/usr/bin/chromium",
    chromeFlags: ["--headless", "--no-sandbox", "--disable-gpu", "--disable-quic", "--no-first-run", "--disable-background-networking", "--disable-component-update", "--disable-sync"],
  });
}

export async function measurePage(chrome: chromeLauncher.LaunchedChrome, url: string, cookie?: string): Promise<PageFigures> {
  const config = { ...desktopConfig, settings: { ...desktopConfig.settings, onlyCategories: ["performance"] } };
  const result = await lighthouse(url, { port: chrome.port, output: "json", logLevel: "error", ...(cookie ? { extraHeaders: { Cookie: cookie } } : {}) }, config);
  if (!result) throw new Error(`lighthouse: no result for ${url}`);
  const { lhr } = result;
  if (lhr.runtimeError) throw new Error(`lighthouse: ${url}: ${lhr.runtimeError.code} ${lhr.runtimeError.message}`);
  const final = lhr.finalDisplayedUrl;
  if (new URL(final).pathname !== new URL(url).pathname) throw new Error(`lighthouse: ${url} ended at ${final} (signed out?)`);
  const audit = (id: string) => lhr.audits[id]?.numericValue ?? NaN;
  const items = ((lhr.audits["network-requests"]?.details as { items?: NetworkItem[] } | undefined)?.items ?? []).filter((i) => i.resourceType === "Script");
  return {
    score: Math.round((lhr.categories.performance?.score ?? 0) * 100),
    lcpMs: audit("largest-contentful-paint"),
    cls: audit("cumulative-layout-shift"),
    tbtMs: audit("total-blocking-time"),
    fcpMs: audit("first-contentful-paint"),
    scripts: {
      count: items.length,
      transferBytes: items.reduce((n, i) => n + (i.transferSize ?? 0), 0),
      resourceBytes: items.reduce((n, i) => n + (i.resourceSize ?? 0), 0),
    },
  };
}
