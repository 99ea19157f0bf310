/**
 * Applies the committed SQL migrations in db/migrations to DATABASE_URL (or the
 * local cluster). Safe to run repeatedly.
 */
import { drizzle } from "drizzle-orm/node-postgres";
import { migrate } from "drizzle-orm/node-postgres/migrator";
import { Pool } from "pg";
import { env } from "../lib/env";

async function main() {
  const pool = new Pool({ connectionString: env.databaseUrl, connectionTimeoutMillis: 5_000, max: 1 });
  try {
    await migrate(drizzle(pool), { migrationsFolder: "db/migrations" });
    console.log("migrate: database is up to date");
  } finally {
    await pool.end();
  }
}

main().catch((err: unknown) => {
  const message = err instanceof Error ? err.message : String(err);
  console.error(`migrate: failed: ${message}. Is PostgreSQL running (npm run db:start)?`);
  process.exit(1);
});
