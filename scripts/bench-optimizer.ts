/**
 * Speed benchmark of the least-cost solver (not a test): median time of one full solve (the
 * panel's problem, LP, rounding, exact re-check, evaluation) for an 8-line dark and a 20-line milk
 * with every standards category of their type ticked (scripts/bench-optimizer-problems.ts), in
 * Node and in headless chromium against the production build — the bench's own panel and the
 * HiGHS WebAssembly the page loads. Target (issue 11): under 20 ms for 20 ingredients in both.
 *
 * It starts its own throw-away PostgreSQL (migrated, demo-seeded, the cases added), builds the
 * app into this slot's build folder (BARWRIGHT_BENCH_SKIP_BUILD=1 reuses it), serves it, measures,
 * and removes everything it started. Run: npm run bench:optimizer (BARWRIGHT_TEST_SLOT=N moves ports).
 */
import { execFileSync, type ChildProcess } from "node:child_process";
import { mkdtempSync } from "node:fs";
import { cpus, loadavg, tmpdir } from "node:os";
import path from "node:path";
import { chromium } from "playwright-core";
import { DEMO_PASSWORD } from "../db/seed";
import { formatPercent, loadLpSolver, solveLeastCost } from "../lib/formulation";
import { CHROMIUM_ARGS, CHROMIUM_PATH } from "../tests/e2e/browser";
import { E2E_DIST_DIR } from "../tests/e2e/config";
import { slot, slotDir, slotPort } from "../tests/support/slot";
import { startServer } from "./bench/stack";
import { medianInPanel } from "./bench-optimizer-browser";
import { CASES, problemOf } from "./bench-optimizer-problems";
import { seedOptimizerCases } from "./bench-optimizer-seed";
import { medianSolveMs, ROUNDS, WARM_UP, type Timing } from "./bench-optimizer-timing";

const PORT = 3108 + 10 * slot;
const BASE = `http://127.0.0.1:${PORT}`;
const cluster = { BARWRIGHT_PG_PORT: String(slotPort(54399)), BARWRIGHT_PG_DIR: slotDir(".data/pg-bench-optimizer"), BARWRIGHT_PG_DB: "barwright_bench_optimizer", BARWRIGHT_PG_FAST: "1" };
const DATABASE_URL = `postgres://postgres@127.0.0.1:${cluster.BARWRIGHT_PG_PORT}/${cluster.BARWRIGHT_PG_DB}`;
// No object storage: a closed port, so the demo seed skips its sample certificate instead of writing elsewhere.
const storage = { BARWRIGHT_S3_ENDPOINT: `http://127.0.0.1:${slotPort(4555)}` };
const env: NodeJS.ProcessEnv = { ...process.env, ...cluster, ...storage, NEXT_TELEMETRY_DISABLED: "1", BARWRIGHT_DIST_DIR: E2E_DIST_DIR };
delete env.DATABASE_URL; // db.sh does nothing when it is set
const run = (cmd: string, args: string[], extra: Record<string, string> = {}) => execFileSync(cmd, args, { env: { ...env, ...extra }, stdio: "inherit" });

const row = (where: string, label: string, r: Timing) =>
  console.log(
    `${where.padEnd(9)} ${label.padEnd(16)} first ${r.first.toFixed(1).padStart(6)} ms  median ${r.median.toFixed(2).padStart(6)} ms${r.cpu === undefined ? "" : ` (CPU ${r.cpu.toFixed(2)} ms)`}  ${r.ok ? (r.median < 20 ? "under" : "OVER") + " the 20 ms target" : "(no solution!)"}`,
  );

/** Node: the same problems, solved by the engine directly; returns the proposals as the panel shows them. */
async function inNode(): Promise<string[][]> {
  const started = performance.now();
  const solver = await loadLpSolver();
  console.log(`node      solver load      ${(performance.now() - started).toFixed(0)} ms`);
  return CASES.map((c) => {
    const problem = problemOf(c);
    row("node", c.label, medianSolveMs(solver, problem));
    const result = solveLeastCost(solver, problem);
    return result.ok ? result.lines.map((l) => formatPercent(l.percent, 1) ?? "") : [];
  });
}

/** `next start` of this slot's build (scripts/bench/stack.ts), once /api/health answers. */
const serve = (): Promise<ChildProcess> => startServer({ env: { ...env, DATABASE_URL }, base: BASE, port: PORT });

async function inChromium(recipeIds: Map<string, string>, fromNode: string[][]): Promise<void> {
  const context = await chromium.launchPersistentContext(mkdtempSync(path.join(tmpdir(), "bw-bench-")), { executablePath: CHROMIUM_PATH, args: CHROMIUM_ARGS, viewport: { width: 1280, height: 900 } });
  try {
    const page = context.pages()[0] ?? (await context.newPage());
    page.on("dialog", (d) => void d.accept()); // leaving a bench with a draft asks first
    await page.goto(`${BASE}/sign-in`);
    await page.getByLabel("E-mail").fill("theo@fenwicklane.example");
    await page.getByLabel("Password").fill(DEMO_PASSWORD);
    await page.getByRole("button", { name: "Sign in" }).click();
    await page.waitForURL((u) => !u.pathname.startsWith("/sign-in"));
    for (const [i, c] of CASES.entries()) {
      const r = await medianInPanel(page, BASE, recipeIds.get(c.recipe)!, c);
      row("chromium", c.label, r);
      // The page solved the very problem Node solved: the same proposal, line for line.
      if (r.proposed.join(" ") !== fromNode[i]!.join(" ")) console.log(`  proposals differ! chromium ${r.proposed.join(" ")} / node ${fromNode[i]!.join(" ")}`);
    }
  } finally {
    await context.close();
  }
}

async function main() {
  console.log(`bench:optimizer — the first solve, then the median of ${ROUNDS} after ${WARM_UP} more; every standards category of the type (load average ${loadavg()[0]!.toFixed(2)} on ${cpus().length} cores)`);
  const fromNode = await inNode();
  run("bash", ["scripts/db.sh", "destroy"]);
  run("bash", ["scripts/db.sh", "start"]);
  let server: ChildProcess | null = null;
  try {
    run("npx", ["tsx", "scripts/migrate.ts"], { DATABASE_URL });
    run("npx", ["tsx", "scripts/seed.ts"], { DATABASE_URL });
    const recipeIds = await seedOptimizerCases(DATABASE_URL, CASES);
    if (process.env.BARWRIGHT_BENCH_SKIP_BUILD !== "1") {
      console.log("bench: building the production app…");
      execFileSync("node", ["node_modules/next/dist/bin/next", "build"], { env, stdio: "ignore" });
    }
    server = await serve();
    await inChromium(recipeIds, fromNode);
  } finally {
    server?.kill("SIGTERM");
    run("bash", ["scripts/db.sh", "destroy"]);
  }
}

main().catch((err: unknown) => {
  console.error(err instanceof Error ? err.message : err);
  process.exitCode = 1;
});
