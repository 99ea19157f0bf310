import { describe, expect, it } from "vitest";
import { GET } from "@/app/api/ping/route";
import { dbScript } from "../support/clusters";

describe("GET /api/ping", () => {
  it("answers 200 without a session and without the database (the load benchmark's ceiling)", async () => {
    dbScript("integration", "stop");
    try {
      const res = GET();
      expect(res.status).toBe(200);
      expect(res.headers.get("cache-control")).toBe("no-store");
      expect(await res.json()).toEqual({ status: "ok" });
    } finally {
      dbScript("integration", "start");
    }
  });
});
