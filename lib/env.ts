import { z } from "zod";

/**
 * The process environment, read once and validated. DATABASE_URL points at any
 * PostgreSQL server; when unset we use the private cluster that scripts/db.sh
 * runs on loopback.
 */
const envSchema = z.object({
  DATABASE_URL: z.string().url().optional(),
  BARWRIGHT_PG_PORT: z.coerce.number().int().min(1).max(65535).default(54329),
  BARWRIGHT_PG_DB: z.string().min(1).default("barwright"),
  NODE_ENV: z.enum(["development", "production", "test"]).default("development"),
});

export type Env = z.infer<typeof envSchema> & { databaseUrl: string };

function readEnv(): Env {
  const parsed = envSchema.safeParse(process.env);
  if (!parsed.success) {
    const detail = parsed.error.issues.map((i) => `${i.path.join(".")}: ${i.message}`).join("; ");
    throw new Error(`Invalid environment: ${detail}`);
  }
  const e = parsed.data;
  const databaseUrl =
    e.DATABASE_URL ?? `postgres://postgres@127.0.0.1:${e.BARWRIGHT_PG_PORT}/${e.BARWRIGHT_PG_DB}`;
  return { ...e, databaseUrl };
}

export const env = readEnv();
