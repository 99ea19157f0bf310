import { execFileSync, spawn, type ChildProcess } from "node:child_process";
import { rmSync } from "node:fs";
import path from "node:path";
import { startFakeS3 } from "../../scripts/fake-s3";
import { startMailSink } from "../../scripts/mail-sink";
import { clusterEnv, clusterUrl, dbScript, fakeS3s, mailSinks, migrateCluster } from "../support/clusters";
import { E2E_BASE_URL, E2E_DIST_DIR, E2E_PORT } from "./config";

/**
 * A throw-away cluster with the demo seed, the production build, and `next start`
 * on loopback. Set BARWRIGHT_E2E_SKIP_BUILD=1 to reuse an existing .next build.
 */
export default async function setup() {
  dbScript("e2e", "destroy");
  dbScript("e2e", "start");
  migrateCluster("e2e");
  // Object storage first: the demo seed stores its sample certificate there.
  rmSync(fakeS3s.e2e.dir, { recursive: true, force: true });
  const s3 = await startFakeS3(fakeS3s.e2e);
  const storage = { BARWRIGHT_S3_ENDPOINT: `http://127.0.0.1:${fakeS3s.e2e.port}`, BARWRIGHT_S3_BUCKET: fakeS3s.e2e.bucket };
  // Not execFileSync: the fake S3 runs in this process and must keep answering while the seed stores its file.
  await new Promise<void>((resolve, reject) => {
    const seed = spawn("npx", ["tsx", "scripts/seed.ts"], { env: { ...clusterEnv("e2e"), ...storage }, stdio: "inherit" });
    seed.on("error", reject);
    seed.on("exit", (code) => (code === 0 ? resolve() : reject(new Error(`e2e: the demo seed failed (exit ${code})`))));
  });
  rmSync(mailSinks.e2e.dir, { recursive: true, force: true });
  const sink = await startMailSink(mailSinks.e2e);
  const env = {
    ...clusterEnv("e2e"),
    ...storage,
    DATABASE_URL: clusterUrl("e2e"),
    NEXT_TELEMETRY_DISABLED: "1",
    BARWRIGHT_SMTP_URL: `smtp://127.0.0.1:${mailSinks.e2e.port}`,
    BARWRIGHT_MAILBOX_DIR: path.resolve(mailSinks.e2e.dir),
    BARWRIGHT_DEMO_MAILBOX: "1",
    BARWRIGHT_DIST_DIR: E2E_DIST_DIR,
  };
  if (process.env.BARWRIGHT_E2E_SKIP_BUILD !== "1") {
    console.log("e2e: building the production app…");
    try {
      execFileSync("node", ["node_modules/next/dist/bin/next", "build"], { env, stdio: "pipe", encoding: "utf8" });
    } catch (err) {
      const e = err as { stdout?: string; stderr?: string };
      console.error(`${e.stdout ?? ""}${e.stderr ?? ""}`);
      throw new Error("e2e: next build failed (output above)");
    }
  }
  const server = spawn("node", ["node_modules/next/dist/bin/next", "start", "-H", "127.0.0.1", "-p", String(E2E_PORT)], {
    env,
    stdio: ["ignore", "ignore", "inherit"],
  });
  await waitForHealth(server);
  console.log(`e2e: app on ${E2E_BASE_URL}`);
  return async () => {
    server.kill("SIGTERM");
    await new Promise<void>((resolve) => sink.close(() => resolve()));
    await s3.close();
    rmSync(fakeS3s.e2e.dir, { recursive: true, force: true });
    dbScript("e2e", "destroy");
  };
}

async function waitForHealth(server: ChildProcess): Promise<void> {
  for (let i = 0; i < 120; i++) {
    if (server.exitCode !== null) throw new Error(`e2e: next start exited with code ${server.exitCode}`);
    try {
      const res = await fetch(`${E2E_BASE_URL}/api/health`);
      if (res.ok) return;
    } catch {
      /* not listening yet */
    }
    await new Promise((r) => setTimeout(r, 500));
  }
  server.kill("SIGTERM");
  throw new Error("e2e: the app did not become healthy within 60 s");
}
