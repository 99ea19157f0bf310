import { NextResponse } from "next/server";
import { pool } from "@/db/client";

/**
 * GET /api/health — 200 `{ status: "ok", database: "up" }` when PostgreSQL
 * answers within two seconds, 503 `{ status: "unavailable", database: "down" }`
 * otherwise.
 */
export async function GET() {
  const up = await databaseAnswers();
  return NextResponse.json(
    up ? { status: "ok", database: "up" } : { status: "unavailable", database: "down" },
    { status: up ? 200 : 503, headers: { "cache-control": "no-store" } },
  );
}

async function databaseAnswers(): Promise<boolean> {
  let timer: NodeJS.Timeout | undefined;
  try {
    const timeout = new Promise<never>((_, reject) => {
      timer = setTimeout(() => reject(new Error("timeout")), 2_000);
    });
    await Promise.race([pool.query("select 1"), timeout]);
    return true;
  } catch {
    return false;
  } finally {
    clearTimeout(timer);
  }
}
