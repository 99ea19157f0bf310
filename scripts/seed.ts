/** Seeds the demo workspace (idempotent). */
import { drizzle } from "drizzle-orm/node-postgres";
import { Pool } from "pg";
import * as schema from "../db/schema";
import { DEMO_PASSWORD, DEMO_PEOPLE, seedDemo } from "../db/seed";
import { env } from "../lib/env";

async function main() {
  const pool = new Pool({ connectionString: env.databaseUrl, connectionTimeoutMillis: 5_000, max: 2 });
  try {
    await seedDemo(drizzle(pool, { schema }));
    console.log("seed: demo workspace “Fenwick Lane Chocolate Works” is ready");
    console.log(`seed: sign in as ${DEMO_PEOPLE[0]?.email} (owner) — password ${DEMO_PASSWORD}`);
  } finally {
    await pool.end();
  }
}

main().catch((err: unknown) => {
  const message = err instanceof Error ? err.message : String(err);
  console.error(`seed: failed: ${message}`);
  process.exit(1);
});
