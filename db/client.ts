import { drizzle } from "drizzle-orm/node-postgres";
import { Pool } from "pg";
import { env } from "@/lib/env";
import * as schema from "./schema";

/**
 * One pool per process. A connection timeout makes a dropped database fail fast
 * (the health route and error pages then say so) instead of hanging, and the
 * `error` listener keeps an idle client's failure from crashing the process.
 * The server-side timeouts bound what one request can hold: a statement runs at
 * most 30 s, and a transaction left idle (a request that died half-way) is
 * ended after 60 s so its row locks are released. `query_timeout` is the
 * client-side twin of statement_timeout for a server that stops answering
 * without closing the socket; keepAlive notices a vanished peer.
 */
function createPool() {
  const pool = new Pool({
    connectionString: env.databaseUrl,
    max: 10,
    connectionTimeoutMillis: 3_000,
    idleTimeoutMillis: 30_000,
    statement_timeout: 30_000,
    query_timeout: 35_000,
    idle_in_transaction_session_timeout: 60_000,
    keepAlive: true,
  });
  pool.on("error", (err) => {
    console.error(`database: idle client error: ${err.message}`);
  });
  // pg-pool listens for errors only while a client is idle; a client checked
  // out for a transaction whose server vanishes between two statements would
  // otherwise emit an unhandled 'error' and end the process. The statement
  // that follows fails on its own, so logging is enough here.
  pool.on("connect", (client) => {
    client.on("error", (err) => console.error(`database: client error: ${err.message}`));
  });
  return pool;
}

const globalForDb = globalThis as unknown as { barwrightPool?: Pool };
export const pool = globalForDb.barwrightPool ?? createPool();
if (env.NODE_ENV !== "production") globalForDb.barwrightPool = pool;

export const db = drizzle(pool, { schema });
export type Db = typeof db;
