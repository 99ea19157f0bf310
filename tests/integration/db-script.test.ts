import { execFileSync, spawnSync } from "node:child_process";
import { readFileSync } from "node:fs";
import net from "node:net";
import { afterAll, describe, expect, it } from "vitest";
import { slotDir, slotPort } from "../support/slot";

const PORT = String(slotPort(54359));
const BUSY_PORT = slotPort(54369);
const DIR = slotDir(".data/pg-script-test");

// A cluster of its own, so stopping and killing it disturbs no other test.
const env: Record<string, string | undefined> = { ...process.env, BARWRIGHT_PG_PORT: PORT, BARWRIGHT_PG_DIR: DIR, BARWRIGHT_PG_DB: "barwright", BARWRIGHT_PG_FAST: "1" };
delete env.DATABASE_URL;

function db(command: string, extra: Record<string, string> = {}) {
  const r = spawnSync("bash", ["scripts/db.sh", command], { env: { ...env, ...extra } as NodeJS.ProcessEnv, encoding: "utf8" });
  return { code: r.status, out: `${r.stdout}${r.stderr}` };
}

describe("scripts/db.sh", () => {
  afterAll(() => {
    db("destroy");
  });

  it("starts a cluster on loopback, and a second start is harmless", () => {
    const first = db("start");
    expect(first.code).toBe(0);
    expect(first.out).toContain(`started PostgreSQL on 127.0.0.1:${PORT}`);
    const again = db("start");
    expect(again.code).toBe(0);
    expect(again.out).toMatch(/already running/);
    const who = execFileSync("psql", ["-h", "127.0.0.1", "-p", PORT, "-U", "postgres", "-tAc", "show listen_addresses", "barwright"], {
      encoding: "utf8",
    });
    expect(who.trim()).toBe("127.0.0.1");
  });

  it("recovers from a stale pid file after the server was killed", () => {
    const pid = Number(readFileSync(`${DIR}/postmaster.pid`, "utf8").split("\n")[0]);
    process.kill(pid, "SIGKILL");
    // Wait (bounded) for the postmaster to be gone; its pid file stays behind.
    for (let i = 0; i < 50; i++) {
      try {
        process.kill(pid, 0);
      } catch {
        break;
      }
      execFileSync("sleep", ["0.1"]);
    }
    const r = db("start");
    expect(r.code).toBe(0);
    expect(r.out).toMatch(/started PostgreSQL/);
  });

  it("says in one clear line when the port is taken by another program", async () => {
    db("stop");
    const blocker = net.createServer();
    await new Promise<void>((resolve) => blocker.listen(BUSY_PORT, "127.0.0.1", resolve));
    try {
      const r = db("start", { BARWRIGHT_PG_PORT: String(BUSY_PORT) });
      expect(r.code).toBe(1);
      expect(r.out).toMatch(new RegExp(`port ${BUSY_PORT} on 127\\.0\\.0\\.1 is already in use .* BARWRIGHT_PG_PORT`));
    } finally {
      blocker.close();
    }
  });

  it("stops, and says so when already stopped", () => {
    expect(db("stop").out).toMatch(/not running|stopped/);
    expect(db("status").code).toBe(3);
  });
});
