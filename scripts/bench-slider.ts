/**
 * Speed benchmark of the bench's sliders (issue 6): in headless chromium against the
 * production build, the time from a slider input to the next paint of the updated
 * composition panel, over 100 pointer-drag moves and 100 arrow-key presses. The page marks
 * "bench:input" in the slider's input handler and "bench:paint" after React committed the
 * composition panel (a requestAnimationFrame, then a message once that frame is painted;
 * components/bench/paint-probe.ts). Target: median under 16 ms, worst under 50 ms.
 *
 * It starts its own throw-away PostgreSQL (migrated, demo-seeded), builds the app into this
 * slot's build folder (BARWRIGHT_BENCH_SKIP_BUILD=1 reuses it), serves it, measures, and
 * removes everything it started. Run: npm run bench:slider (BARWRIGHT_TEST_SLOT=N to move ports).
 */
import { execFileSync, type ChildProcess } from "node:child_process";
import { mkdtempSync } from "node:fs";
import { cpus, loadavg, tmpdir } from "node:os";
import path from "node:path";
import { chromium, type Page } from "playwright-core";
import { DEMO_PASSWORD } from "../db/seed";
import { CHROMIUM_ARGS, CHROMIUM_PATH } from "../tests/e2e/browser";
import { E2E_DIST_DIR } from "../tests/e2e/config";
import { slot, slotDir, slotPort } from "../tests/support/slot";
import { startServer } from "./bench/stack";

const PORT = 3105 + 10 * slot;
const BASE = `http://127.0.0.1:${PORT}`;
const MOVES = 100;
const cluster = { BARWRIGHT_PG_PORT: String(slotPort(54359)), BARWRIGHT_PG_DIR: slotDir(".data/pg-bench"), BARWRIGHT_PG_DB: "barwright_bench", BARWRIGHT_PG_FAST: "1" };
const env: NodeJS.ProcessEnv = { ...process.env, ...cluster, NEXT_TELEMETRY_DISABLED: "1", BARWRIGHT_DIST_DIR: E2E_DIST_DIR };
delete env.DATABASE_URL;
const run = (cmd: string, args: string[]) => execFileSync(cmd, args, { env, stdio: "inherit" });

/** `next start` of this slot's build (scripts/bench/stack.ts), once /api/health answers. */
const serve = (): Promise<ChildProcess> => startServer({ env, base: BASE, port: PORT });

type Sample = { durations: number[]; commits: number[]; unpainted: number };

/**
 * Input → paint durations (ms) from the page's marks, and input → commit (the script's share);
 * an input with no paint before the next input is counted apart. Evaluated as a string: tsx
 * would add helpers to a function that the page does not have.
 */
async function collect(page: Page): Promise<Sample> {
  return page.evaluate(`(() => {
    const marks = performance.getEntriesByType("mark").filter(function (m) { return m.name.indexOf("bench:") === 0; }).sort(function (a, b) { return a.startTime - b.startTime; });
    const durations = [], commits = [];
    let unpainted = 0;
    marks.forEach(function (m, i) {
      if (m.name !== "bench:input") return;
      const later = marks.slice(i + 1);
      const next = later.find(function (x) { return x.name === "bench:paint" || x.name === "bench:input"; });
      const commit = later.find(function (x) { return x.name !== "bench:paint"; });
      if (next && next.name === "bench:paint") durations.push(next.startTime - m.startTime); else unpainted++;
      if (commit && commit.name === "bench:commit") commits.push(commit.startTime - m.startTime);
    });
    performance.clearMarks();
    return { durations: durations, commits: commits, unpainted: unpainted };
  })()`) as Promise<Sample>;
}

/** Waits for the paint that follows an input, then for the next frame slot (inputs come at most once a frame). */
async function settle(page: Page, paintsBefore: number): Promise<void> {
  await page
    .waitForFunction((n) => performance.getEntriesByName("bench:paint").length > n, paintsBefore, { timeout: 1000, polling: "raf" })
    .catch(() => undefined);
  await page.waitForTimeout(16);
}

const paints = (page: Page) => page.evaluate(() => performance.getEntriesByName("bench:paint").length);

async function dragMoves(page: Page, name: string): Promise<void> {
  const thumb = page.getByRole("slider", { name, exact: true });
  const box = (await thumb.boundingBox())!;
  const track = (await page.locator("li", { has: thumb }).locator("[data-orientation=horizontal]").first().boundingBox())!;
  const step = track.width / 100; // 1 % of the track per move: every move changes the value
  let x = box.x + box.width / 2;
  const y = box.y + box.height / 2;
  await page.mouse.move(x, y);
  await page.mouse.down();
  for (let i = 0; i < MOVES; i++) {
    // Up a quarter, down half, up a quarter: the thumb stays inside the track, so every move counts.
    x += i < MOVES / 4 || i >= (3 * MOVES) / 4 ? step : -step;
    const before = await paints(page);
    await page.mouse.move(x, y);
    await settle(page, before);
  }
  await page.mouse.up();
}

async function keyMoves(page: Page, name: string): Promise<void> {
  await page.getByRole("slider", { name, exact: true }).focus();
  for (let i = 0; i < MOVES; i++) {
    const before = await paints(page);
    await page.keyboard.press(i < MOVES / 2 ? "ArrowRight" : "ArrowLeft");
    await settle(page, before);
  }
}

const quantile = (values: number[], q: number) => {
  const sorted = [...values].sort((a, b) => a - b);
  return sorted[Math.min(sorted.length - 1, Math.floor(q * sorted.length))] ?? NaN;
};

function report(label: string, { durations, commits, unpainted }: Sample): boolean {
  const sorted = [...durations].sort((a, b) => a - b);
  const at = (q: number) => quantile(sorted, q);
  const median = at(0.5);
  const worst = sorted[sorted.length - 1] ?? NaN;
  const ok = median < 16 && worst < 50;
  console.log(
    `${label.padEnd(12)} n=${String(sorted.length).padStart(3)}  median ${median.toFixed(1).padStart(5)} ms  p95 ${at(0.95).toFixed(1).padStart(5)} ms  worst ${worst.toFixed(1).padStart(5)} ms  (input → commit median ${quantile(commits, 0.5).toFixed(1)} ms)  ${unpainted ? `(${unpainted} without a paint) ` : ""}${ok ? "meets" : "misses"} the target`,
  );
  return ok;
}

async function measure(): Promise<boolean> {
  const context = await chromium.launchPersistentContext(mkdtempSync(path.join(tmpdir(), "bw-bench-")), { executablePath: CHROMIUM_PATH, args: CHROMIUM_ARGS, viewport: { width: 1280, height: 900 } });
  try {
    const page = context.pages()[0] ?? (await context.newPage());
    await page.goto(`${BASE}/sign-in`);
    await page.getByLabel("E-mail").fill("theo@fenwicklane.example");
    await page.getByLabel("Password").fill(DEMO_PASSWORD);
    await page.getByRole("button", { name: "Sign in" }).click();
    await page.waitForURL((u) => !u.pathname.startsWith("/sign-in"));
    const list = (await (await page.request.get(`${BASE}/api/recipes?q=House%20dark`)).json()) as { rows: { id: string }[] };
    await page.evaluate(() => window.localStorage.setItem("barwright:bench-probe", "1"));
    await page.goto(`${BASE}/recipes/${list.rows[0]!.id}`);
    await page.getByTestId("composition-panel").waitFor();
    await page.waitForTimeout(1000);
    await page.evaluate(() => performance.clearMarks());
    await dragMoves(page, "Cocoa nibs (roasted)");
    const drag = await collect(page);
    await keyMoves(page, "Sugar (sucrose)");
    const keys = await collect(page);
    console.log(`\nbench:slider — input to next paint of the composition panel, ${MOVES} moves each (headless chromium, production build; load average ${loadavg()[0]!.toFixed(2)} on ${cpus().length} cores)`);
    const a = report("pointer drag", drag);
    const b = report("arrow keys", keys);
    return a && b;
  } finally {
    await context.close();
  }
}

async function main() {
  run("bash", ["scripts/db.sh", "destroy"]);
  run("bash", ["scripts/db.sh", "start"]);
  let server: ChildProcess | null = null;
  try {
    run("npx", ["tsx", "scripts/migrate.ts"]);
    run("npx", ["tsx", "scripts/seed.ts"]);
    if (process.env.BARWRIGHT_BENCH_SKIP_BUILD !== "1") {
      console.log("bench: building the production app…");
      execFileSync("node", ["node_modules/next/dist/bin/next", "build"], { env, stdio: "ignore" });
    }
    server = await serve();
    const ok = await measure();
    process.exitCode = ok ? 0 : 1;
  } finally {
    server?.kill("SIGTERM");
    run("bash", ["scripts/db.sh", "destroy"]);
  }
}

main().catch((err: unknown) => {
  console.error(err instanceof Error ? err.message : err);
  process.exitCode = 1;
});
