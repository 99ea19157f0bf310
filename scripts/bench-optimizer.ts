/**
 * Speed benchmark of the least-cost solver (not a test): median time of one full solve for an
 * 8-line dark and a 20-line milk recipe with every limit of three standards categories, in Node
 * and in Debian's chromium (the same code bundled by esbuild, HiGHS's WebAssembly served from a
 * loopback HTTP server). Target (issue 11): under 20 ms for 20 ingredients in both.
 * Run: npm run bench:optimizer
 */
import { build } from "esbuild";
import { readFile } from "node:fs/promises";
import { createServer } from "node:http";
import path from "node:path";
import { loadLpSolver } from "../lib/formulation";
import { launchBrowser } from "../tests/e2e/browser";
import { DARK_8, MILK_20 } from "./bench-optimizer-problems";
import { medianSolveMs } from "./bench-optimizer-timing";

const row = (where: string, name: string, r: { median: number; ok: boolean }) =>
  console.log(`${where.padEnd(9)} ${name.padEnd(26)} median ${r.median.toFixed(2).padStart(7)} ms${r.ok ? "" : "  (no solution!)"}`);

async function inNode() {
  const started = performance.now();
  const solver = await loadLpSolver();
  console.log(`node      solver load                ${(performance.now() - started).toFixed(0)} ms`);
  row("node", "8 lines (dark, 3 categories)", medianSolveMs(solver, DARK_8));
  row("node", "20 lines (milk, 3 categories)", medianSolveMs(solver, MILK_20));
}

async function inChromium() {
  const bundle = await build({ entryPoints: [path.join(__dirname, "bench-optimizer-browser.ts")], bundle: true, format: "esm", write: false, platform: "browser", external: ["node:*"], logLevel: "error" });
  const wasm = await readFile(path.join(process.cwd(), "node_modules/highs/build/highs.wasm"));
  const files: Record<string, [string, string | Uint8Array]> = {
    "/": ["text/html", '<!doctype html><script type="module" src="/bench.js"></script>'],
    "/bench.js": ["text/javascript", bundle.outputFiles[0]!.text],
    "/highs.wasm": ["application/wasm", new Uint8Array(wasm)],
  };
  const server = createServer((req, res) => {
    const file = files[req.url ?? ""];
    if (!file) return void res.writeHead(404).end();
    res.writeHead(200, { "content-type": file[0] }).end(file[1]);
  });
  await new Promise<void>((resolve) => server.listen(0, "127.0.0.1", resolve));
  const port = (server.address() as { port: number }).port;
  const browser = await launchBrowser();
  try {
    const page = await browser.newPage();
    await page.goto(`http://127.0.0.1:${port}/`);
    await page.waitForFunction(() => (window as unknown as { benchResult?: unknown }).benchResult !== undefined, undefined, { timeout: 120_000 });
    const result = (await page.evaluate(() => (window as unknown as { benchResult: unknown }).benchResult)) as Record<string, { median: number; ok: boolean }>;
    row("chromium", "8 lines (dark, 3 categories)", result.dark8!);
    row("chromium", "20 lines (milk, 3 categories)", result.milk20!);
  } finally {
    await browser.close();
    server.close();
  }
}

void (async () => {
  await inNode();
  await inChromium();
})();
