import { afterAll, describe, expect, it } from "vitest";
import { GET } from "@/app/api/health/route";
import { pool } from "@/db/client";
import { dbScript } from "../support/clusters";

describe("GET /api/health", () => {
  afterAll(() => dbScript("integration", "start"));

  it("answers 200 with database up while PostgreSQL runs", async () => {
    const res = await GET();
    expect(res.status).toBe(200);
    expect(await res.json()).toEqual({ status: "ok", database: "up" });
  });

  it("answers 503 with database down when PostgreSQL is stopped, and recovers when it is back", async () => {
    dbScript("integration", "stop");
    const down = await GET();
    expect(down.status).toBe(503);
    expect(await down.json()).toEqual({ status: "unavailable", database: "down" });

    dbScript("integration", "start");
    const up = await GET();
    expect(up.status).toBe(200);
    // The pool replaced its dead connections by itself.
    expect((await pool.query("select 1 as one")).rows[0]).toEqual({ one: 1 });
  });
});
