/**
 * A second production server for the fault tests, from the build the e2e
 * setup made, on its own port and its own PostgreSQL cluster (seeded with the
 * demo), so stopping the database or killing the process touches nothing the
 * other browser tests use. SQL checks go through a plain pg client.
 */
import { spawn, type ChildProcess } from "node:child_process";
import { randomBytes, createHash } from "node:crypto";
import { Client } from "pg";
import { clusterEnv, clusterUrl, dbScript, migrateCluster } from "../../support/clusters";
import { E2E_DIST_DIR, E2E_PORT } from "../config";

export const FAULT_PORT = E2E_PORT + 5;
export const FAULT_BASE_URL = `http://127.0.0.1:${FAULT_PORT}`;

export async function startCluster(): Promise<void> {
  dbScript("faults", "destroy");
  dbScript("faults", "start");
  migrateCluster("faults");
  // No object storage here (port 1 refuses at once): the seed skips its sample certificate, which these tests never read.
  const env = { ...clusterEnv("faults"), BARWRIGHT_S3_ENDPOINT: "http://127.0.0.1:1" };
  await new Promise<void>((resolve, reject) => {
    const seed = spawn("npx", ["tsx", "scripts/seed.ts"], { env, stdio: "ignore" });
    const timer = setTimeout(() => seed.kill("SIGKILL"), 120_000);
    seed.on("exit", (code) => {
      clearTimeout(timer);
      if (code === 0) resolve();
      else reject(new Error(`faults: the demo seed failed (exit ${code})`));
    });
  });
}

/** scripts/db.sh stop|start on the faults cluster, without blocking this process (the load keeps running meanwhile). */
export function databaseScript(command: "stop" | "start"): Promise<void> {
  return new Promise((resolve, reject) => {
    const p = spawn("bash", ["scripts/db.sh", command], { env: clusterEnv("faults"), stdio: "ignore" });
    p.on("exit", (code) => (code === 0 ? resolve() : reject(new Error(`faults: db.sh ${command} exited with ${code}`))));
  });
}
export const destroyCluster = () => dbScript("faults", "destroy");

/** `next start` on FAULT_PORT against the faults cluster; resolves once /api/health says ok. */
export async function startApp(): Promise<ChildProcess> {
  const env = { ...clusterEnv("faults"), DATABASE_URL: clusterUrl("faults"), NEXT_TELEMETRY_DISABLED: "1", BARWRIGHT_DIST_DIR: E2E_DIST_DIR };
  const app = spawn("node", ["node_modules/next/dist/bin/next", "start", "-H", "127.0.0.1", "-p", String(FAULT_PORT)], { env, stdio: ["ignore", "ignore", "pipe"] });
  app.stderr!.on("data", (chunk: Buffer) => stderrOf.set(app, (stderrOf.get(app) ?? "") + chunk.toString()));
  if (!(await waitForHealth(30_000, app))) {
    app.kill("SIGKILL");
    throw new Error(`faults: the app did not become healthy:\n${stderrOf.get(app) ?? ""}`);
  }
  return app;
}

const stderrOf = new WeakMap<ChildProcess, string>();
/** What the server wrote to stderr (its logged errors). */
export const stderr = (app: ChildProcess) => stderrOf.get(app) ?? "";

/** True once GET /api/health answers 200 within `ms`. */
export async function waitForHealth(ms: number, app?: ChildProcess): Promise<boolean> {
  const until = Date.now() + ms;
  while (Date.now() < until) {
    if (app && app.exitCode !== null) return false;
    try {
      const res = await fetch(`${FAULT_BASE_URL}/api/health`, { signal: AbortSignal.timeout(3_000) });
      if (res.ok) return true;
    } catch {
      /* not listening, or the database not yet back */
    }
    await new Promise((r) => setTimeout(r, 250));
  }
  return false;
}

export async function sql(): Promise<Client> {
  const client = new Client({ connectionString: clusterUrl("faults") });
  client.on("error", () => undefined); // a test that stops the server ends its clients first; a late error is no news
  await client.connect();
  return client;
}

/** A session for a demo person, written the way sign-in writes it (the table keeps the token's SHA-256). */
export async function sessionCookie(db: Client, email: string): Promise<{ cookie: string; workspaceId: string; userId: string }> {
  const { rows } = await db.query<{ user_id: string; workspace_id: string }>(
    "select m.user_id, m.workspace_id from memberships m join users u on u.id = m.user_id where u.email = $1 limit 1",
    [email],
  );
  const { user_id: userId, workspace_id: workspaceId } = rows[0]!;
  const token = randomBytes(20).toString("base64url");
  const id = createHash("sha256").update(token).digest("hex");
  await db.query("insert into sessions (id, user_id, active_workspace_id, expires_at) values ($1, $2, $3, now() + interval '1 day')", [id, userId, workspaceId]);
  return { cookie: `barwright_session=${token}`, workspaceId, userId };
}

/** Same-origin headers for a request that changes data (apiRoute's CSRF check). */
export function writeHeaders(cookie: string, contentType?: string): Record<string, string> {
  return { cookie, origin: FAULT_BASE_URL, "sec-fetch-site": "same-origin", ...(contentType ? { "content-type": contentType } : {}) };
}
