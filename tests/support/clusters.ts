import { execFileSync } from "node:child_process";
import { slotDir, slotPort } from "./slot";

/**
 * Throw-away PostgreSQL clusters for the test run: each kind of test has its own
 * port and data folder, created by its global setup and removed afterwards.
 */
export const clusters = {
  integration: { port: slotPort(54339), dir: slotDir(".data/pg-integration"), db: "barwright_test" },
  e2e: { port: slotPort(54349), dir: slotDir(".data/pg-e2e"), db: "barwright_e2e" },
  // The fault tests stop and start their own cluster under their own app server (tests/e2e/zz-faults.test.ts).
  faults: { port: slotPort(54359), dir: slotDir(".data/pg-faults"), db: "barwright_faults" },
} as const;

export type ClusterName = keyof typeof clusters;

export function clusterUrl(name: ClusterName): string {
  const c = clusters[name];
  return `postgres://postgres@127.0.0.1:${c.port}/${c.db}`;
}

/** Environment for scripts that act on a cluster (never an inherited DATABASE_URL). */
export function clusterEnv(name: ClusterName): NodeJS.ProcessEnv {
  const c = clusters[name];
  const env: NodeJS.ProcessEnv = {
    ...process.env,
    BARWRIGHT_PG_PORT: String(c.port),
    BARWRIGHT_PG_DIR: c.dir,
    BARWRIGHT_PG_DB: c.db,
    BARWRIGHT_PG_FAST: "1",
  };
  delete env.DATABASE_URL;
  return env;
}

export function dbScript(name: ClusterName, command: "start" | "stop" | "destroy"): void {
  execFileSync("bash", ["scripts/db.sh", command], { env: clusterEnv(name), stdio: "inherit" });
}

export function migrateCluster(name: ClusterName): void {
  execFileSync("npx", ["tsx", "scripts/migrate.ts"], { env: clusterEnv(name), stdio: "inherit" });
}

/** Local SMTP sinks for the test run (one per kind of test). */
export const mailSinks = {
  integration: { port: slotPort(2535), dir: slotDir(".data/mailbox-integration") },
  e2e: { port: slotPort(2545), dir: slotDir(".data/mailbox-e2e") },
} as const;

/** Local fake S3 servers for the test run (one per kind of test; scripts/fake-s3.ts). */
export const fakeS3s = {
  integration: { port: slotPort(4535), dir: slotDir(".data/s3-integration"), bucket: "barwright-test" },
  e2e: { port: slotPort(4545), dir: slotDir(".data/s3-e2e"), bucket: "barwright-e2e" },
} as const;
