/**
 * The throw-away stack a benchmark runs against: its own PostgreSQL cluster on
 * loopback (scripts/db.sh, fsync off), migrated and demo-seeded, and the
 * production build served by Next's own binary. Ports and folders move with
 * BARWRIGHT_TEST_SLOT like the tests' (tests/support/slot.ts).
 */
import { execFileSync, spawn, type ChildProcess } from "node:child_process";
import { readFileSync, writeFileSync } from "node:fs";
import { E2E_DIST_DIR } from "../../tests/e2e/config";
import { slot, slotDir, slotPort } from "../../tests/support/slot";

export type Stack = { env: NodeJS.ProcessEnv; base: string; port: number; databaseUrl: string };

/** `name` picks the cluster and port: each benchmark has its own, so two can run side by side. */
export function stackFor(name: "load" | "pages"): Stack {
  const pgPort = slotPort(name === "load" ? 54379 : 54389);
  const db = `barwright_bench_${name}`;
  const port = (name === "load" ? 3106 : 3107) + 10 * slot;
  const env: NodeJS.ProcessEnv = {
    ...process.env,
    BARWRIGHT_PG_PORT: String(pgPort),
    BARWRIGHT_PG_DIR: slotDir(`.data/pg-bench-${name}`),
    BARWRIGHT_PG_DB: db,
    BARWRIGHT_PG_FAST: "1",
    NEXT_TELEMETRY_DISABLED: "1",
    AWS_SDK_JS_NODE_VERSION_SUPPORT_WARNING_DISABLED: "true",
    BARWRIGHT_DIST_DIR: E2E_DIST_DIR,
  };
  delete env.DATABASE_URL;
  const databaseUrl = `postgres://postgres@127.0.0.1:${pgPort}/${db}`;
  return { env: { ...env, DATABASE_URL: databaseUrl }, base: `http://127.0.0.1:${port}`, port, databaseUrl };
}

const run = (stack: Stack, cmd: string, args: string[]) => {
  // db.sh does nothing when DATABASE_URL is set: give it the cluster settings only.
  const env = { ...stack.env };
  if (cmd === "bash") delete env.DATABASE_URL;
  execFileSync(cmd, args, { env, stdio: "inherit" });
};

/** A fresh cluster, migrated, with the demo workspace. */
export function freshDatabase(stack: Stack): void {
  run(stack, "bash", ["scripts/db.sh", "destroy"]);
  run(stack, "bash", ["scripts/db.sh", "start"]);
  run(stack, "npx", ["tsx", "scripts/migrate.ts"]);
  run(stack, "npx", ["tsx", "scripts/seed.ts"]);
}

export function destroyDatabase(stack: Stack): void {
  try {
    run(stack, "bash", ["scripts/db.sh", "destroy"]);
  } catch {
    console.error("bench: could not remove the cluster (see above)");
  }
}

/** `next build` into this slot's build folder unless BARWRIGHT_BENCH_SKIP_BUILD=1 (reuse the last one). */
export function buildApp(stack: Stack): void {
  if (process.env.BARWRIGHT_BENCH_SKIP_BUILD === "1") {
    console.log(`bench: reusing the build in ${E2E_DIST_DIR} (BARWRIGHT_BENCH_SKIP_BUILD=1)`);
    return;
  }
  console.log(`bench: building the production app into ${E2E_DIST_DIR}…`);
  const t = Date.now();
  // A build into another folder adds that folder's types to tsconfig.json: put it back as it was.
  const tsconfig = readFileSync("tsconfig.json", "utf8");
  try {
    execFileSync("node", ["node_modules/next/dist/bin/next", "build"], { env: stack.env, stdio: "pipe", encoding: "utf8" });
  } catch (err) {
    const e = err as { stdout?: string; stderr?: string };
    console.error(`${e.stdout ?? ""}${e.stderr ?? ""}`);
    throw new Error("bench: next build failed (output above)");
  } finally {
    if (readFileSync("tsconfig.json", "utf8") !== tsconfig) writeFileSync("tsconfig.json", tsconfig);
  }
  console.log(`bench: built in ${((Date.now() - t) / 1000).toFixed(0)} s`);
}

/** `next start` on loopback by its own binary (one PID to end), once /api/health answers. */
export async function startServer(stack: Pick<Stack, "env" | "base" | "port">): Promise<ChildProcess> {
  const server = spawn("node", ["node_modules/next/dist/bin/next", "start", "-H", "127.0.0.1", "-p", String(stack.port)], {
    env: stack.env,
    stdio: ["ignore", "ignore", "inherit"],
  });
  for (let i = 0; i < 120; i++) {
    if (server.exitCode !== null) throw new Error(`bench: next start exited with code ${server.exitCode}`);
    if (await fetch(`${stack.base}/api/health`).then((r) => r.ok).catch(() => false)) return server;
    await new Promise((r) => setTimeout(r, 500));
  }
  server.kill("SIGTERM");
  throw new Error("bench: the app did not become healthy within 60 s");
}

/**
 * Runs `main` with the stack torn down afterwards, also on Ctrl-C or SIGTERM
 * (the server first, then the cluster).
 */
export async function withCleanup(stack: Stack, main: (track: (server: ChildProcess) => void) => Promise<boolean>): Promise<void> {
  let server: ChildProcess | null = null;
  let cleaned = false;
  const cleanup = () => {
    if (cleaned) return;
    cleaned = true;
    if (server && server.exitCode === null) server.kill("SIGTERM");
    destroyDatabase(stack);
  };
  const onSignal = (signal: NodeJS.Signals) => {
    console.error(`\nbench: ${signal}: stopping the server and removing the cluster…`);
    cleanup();
    process.exit(130);
  };
  process.once("SIGINT", onSignal);
  process.once("SIGTERM", onSignal);
  try {
    const ok = await main((s) => (server = s));
    process.exitCode = ok ? 0 : 1;
  } catch (err) {
    console.error(err instanceof Error ? err.message : err);
    process.exitCode = 1;
  } finally {
    cleanup();
  }
}
