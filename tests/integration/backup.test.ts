import { spawnSync } from "node:child_process";
import { mkdtempSync } from "node:fs";
import { tmpdir } from "node:os";
import path from "node:path";
import { eq } from "drizzle-orm";
import { describe, expect, it } from "vitest";
import { db } from "@/db/client";
import { workspaces } from "@/db/schema";
import { createTeam } from "../support/fixtures";

function backup(args: string[]) {
  const r = spawnSync("bash", ["scripts/backup.sh", ...args], { env: process.env, encoding: "utf8" });
  return { code: r.status, out: `${r.stdout}${r.stderr}` };
}

describe("scripts/backup.sh", () => {
  it("dumps the whole database and restores it, bringing back what was lost", async () => {
    const team = await createTeam("backup");
    const file = path.join(mkdtempSync(path.join(tmpdir(), "bw-backup-")), "db.dump");
    const dump = backup(["dump", file]);
    expect(dump.code).toBe(0);
    expect(dump.out).toContain(`backup: wrote ${file}`);

    // A mistake after the backup: the workspace is renamed.
    await db.update(workspaces).set({ name: "renamed by mistake" }).where(eq(workspaces.id, team.workspaceId));
    const restore = backup(["restore", file, "--yes"]);
    expect(restore.code).toBe(0);
    const [ws] = await db.select().from(workspaces).where(eq(workspaces.id, team.workspaceId));
    expect(ws?.name).toBe("backup works");
  });

  it("says what to do when the file is missing", () => {
    const r = backup(["restore", "/nonexistent.dump", "--yes"]);
    expect(r.code).toBe(1);
    expect(r.out).toContain("give the dump file to restore");
  });
});
