import { NextResponse } from "next/server";

/**
 * GET /api/ping — 200 `{ status: "ok" }` without touching the database or the
 * session: what the framework alone costs per request. The load benchmark
 * (scripts/bench-load.ts) measures it as the ceiling the other routes are
 * compared with; /api/health asks PostgreSQL and is not that.
 */
export function GET() {
  return NextResponse.json({ status: "ok" }, { headers: { "cache-control": "no-store" } });
}

// Rendered per request like every other handler (a static copy would not be the same work).
export const dynamic = "force-dynamic";
