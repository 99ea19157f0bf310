import { beforeEach, describe, expect, it } from "vitest";
import type { Viewer } from "@/lib/auth/current";
import { forgetAllViewers, forgetSession, forgetViewersOf, recentViewer, rememberViewer, ttlFromEnv } from "@/lib/auth/viewer-cache";

const viewer = (userId: string, workspaceId = "w1"): Viewer => ({
  user: { id: userId, email: `${userId}@test.example`, name: userId },
  workspace: { id: workspaceId, name: "Test works" },
  role: "formulator",
});
const t0 = 1_000_000;
const FAR = Number.MAX_SAFE_INTEGER;

beforeEach(() => forgetAllViewers());

describe("viewer cache", () => {
  it("keeps a viewer for the TTL and not a millisecond more", () => {
    rememberViewer("s1", viewer("u1"), FAR, t0, 5_000);
    expect(recentViewer("s1", t0 + 4_999)?.user.id).toBe("u1");
    expect(recentViewer("s1", t0 + 5_000)).toBeNull();
    // Gone once seen expired.
    expect(recentViewer("s1", t0)).toBeNull();
  });

  it("never keeps a viewer past the session's own end", () => {
    rememberViewer("s1", viewer("u1"), t0 + 1_000, t0, 5_000);
    expect(recentViewer("s1", t0 + 999)).not.toBeNull();
    expect(recentViewer("s1", t0 + 1_000)).toBeNull();
    rememberViewer("s2", viewer("u1"), t0 - 1, t0, 5_000);
    expect(recentViewer("s2", t0)).toBeNull();
  });

  it("keeps nothing with a TTL of 0 (BARWRIGHT_VIEWER_CACHE_MS=0)", () => {
    rememberViewer("s1", viewer("u1"), FAR, t0, 0);
    expect(recentViewer("s1", t0)).toBeNull();
  });

  it("forgets one session, or every session of one person", () => {
    rememberViewer("a1", viewer("alice"), FAR, t0, 5_000);
    rememberViewer("a2", viewer("alice", "w2"), FAR, t0, 5_000);
    rememberViewer("b1", viewer("bob"), FAR, t0, 5_000);
    forgetSession("a1");
    expect(recentViewer("a1", t0)).toBeNull();
    expect(recentViewer("a2", t0)).not.toBeNull();
    forgetViewersOf("alice");
    expect(recentViewer("a2", t0)).toBeNull();
    expect(recentViewer("b1", t0)?.user.id).toBe("bob");
  });

  it("drops the oldest entries past 10,000", () => {
    for (let i = 0; i <= 10_000; i++) rememberViewer(`s${i}`, viewer(`u${i}`), FAR, t0, 5_000);
    expect(recentViewer("s0", t0)).toBeNull();
    expect(recentViewer("s1", t0)).not.toBeNull();
    expect(recentViewer("s10000", t0)).not.toBeNull();
  });

  it("reads its TTL from the environment: a number of ms from 0 to 60,000, else the default", () => {
    expect(ttlFromEnv(undefined, 5_000)).toBe(5_000);
    expect(ttlFromEnv("", 5_000)).toBe(5_000);
    expect(ttlFromEnv("0", 5_000)).toBe(0);
    expect(ttlFromEnv("1500", 5_000)).toBe(1_500);
    expect(ttlFromEnv("999999", 5_000)).toBe(60_000);
    expect(ttlFromEnv("-1", 5_000)).toBe(5_000);
    expect(ttlFromEnv("soon", 5_000)).toBe(5_000);
  });
});
