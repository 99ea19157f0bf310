import { defineConfig } from "drizzle-kit";

const port = process.env.BARWRIGHT_PG_PORT ?? "54329";

export default defineConfig({
  dialect: "postgresql",
  schema: "./db/schema/index.ts",
  out: "./db/migrations",
  dbCredentials: {
    url: process.env.DATABASE_URL ?? `postgres://postgres@127.0.0.1:${port}/barwright`,
  },
  strict: true,
  verbose: true,
});
