import { drizzle } from "drizzle-orm/node-postgres";
import { Pool } from "pg";
import { env } from "@/lib/env";
import * as schema from "./schema";

/**
 * One pool per process. A connection timeout makes a dropped database fail fast
 * (the health route and error pages then say so) instead of hanging, and the
 * `error` listener keeps an idle client's failure from crashing the process.
 */
function createPool() {
  const pool = new Pool({
    connectionString: env.databaseUrl,
    max: 10,
    connectionTimeoutMillis: 3_000,
    idleTimeoutMillis: 30_000,
  });
  pool.on("error", (err) => {
    console.error(`database: idle client error: ${err.message}`);
  });
  return pool;
}

const globalForDb = globalThis as unknown as { barwrightPool?: Pool };
export const pool = globalForDb.barwrightPool ?? createPool();
if (env.NODE_ENV !== "production") globalForDb.barwrightPool = pool;

export const db = drizzle(pool, { schema });
export type Db = typeof db;
