// One Lighthouse 12 performance run (node API) in Debian's Chromium, desktop preset
// (simulated 40 ms RTT, 10 Mbit/s, no CPU slowdown), printed as one JSON line.
// Plain JavaScript run by plain node: under tsx, Lighthouse's page-side functions would
// carry tsx's helpers into the page, which does not have them.
//   node scripts/bench/lighthouse-page.mjs URL [COOKIE]
import * as chromeLauncher from "chrome-launcher";
import lighthouse, { desktopConfig } from "lighthouse";

const [url, cookie] = process.argv.slice(2);
const chrome = await chromeLauncher.launch({
  chromePath: process.env.BARWRIGHT_CHROMIUM ?? "/usr/bin/chromium",
  chromeFlags: ["--headless", "--no-sandbox", "--disable-gpu", "--disable-quic", "--no-first-run", "--disable-background-networking", "--disable-component-update", "--disable-sync"],
});
try {
  const config = { ...desktopConfig, settings: { ...desktopConfig.settings, onlyCategories: ["performance"] } };
  const result = await lighthouse(url, { port: chrome.port, output: "json", logLevel: "error", ...(cookie ? { extraHeaders: { Cookie: cookie } } : {}) }, config);
  const lhr = result?.lhr;
  if (!lhr) throw new Error(`no result for ${url}`);
  if (lhr.runtimeError) throw new Error(`${url}: ${lhr.runtimeError.code} ${lhr.runtimeError.message}`);
  if (new URL(lhr.finalDisplayedUrl).pathname !== new URL(url).pathname) throw new Error(`${url} ended at ${lhr.finalDisplayedUrl} (signed out?)`);
  const value = (id) => lhr.audits[id]?.numericValue ?? null;
  const scripts = (lhr.audits["network-requests"]?.details?.items ?? []).filter((i) => i.resourceType === "Script");
  const sum = (key) => scripts.reduce((n, i) => n + (i[key] ?? 0), 0);
  const figures = {
    score: Math.round((lhr.categories.performance?.score ?? 0) * 100),
    lcpMs: value("largest-contentful-paint"),
    cls: value("cumulative-layout-shift"),
    tbtMs: value("total-blocking-time"),
    fcpMs: value("first-contentful-paint"),
    scripts: { count: scripts.length, transferBytes: sum("transferSize"), resourceBytes: sum("resourceSize"), urls: scripts.map((i) => `${new URL(i.url).pathname} ${i.resourceSize}`) },
  };
  if (process.env.BARWRIGHT_BENCH_DETAIL === "1") {
    // Where the blocking time goes: long tasks and each script's main-thread time.
    const items = (id) => lhr.audits[id]?.details?.items ?? [];
    process.stderr.write(`${JSON.stringify({ longTasks: items("long-tasks"), bootup: items("bootup-time"), mainThread: items("mainthread-work-breakdown") }, null, 1)}\n`);
  }
  process.stdout.write(`${JSON.stringify(figures)}\n`);
} finally {
  chrome.kill();
}
