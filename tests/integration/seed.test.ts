import { count, eq } from "drizzle-orm";
import { describe, expect, it } from "vitest";
import { db } from "@/db/client";
import { memberships, users, workspaces } from "@/db/schema";
import { DEMO_PASSWORD, DEMO_PEOPLE, DEMO_WORKSPACE, seedDemo } from "@/db/seed";
import { verifyPassword } from "@/lib/auth/password";

describe("seedDemo", () => {
  it("creates the demo workspace with one member per role, and seeding twice duplicates nothing", async () => {
    const first = await seedDemo(db);
    const second = await seedDemo(db);
    expect(second.workspaceId).toBe(first.workspaceId);

    const [ws] = await db.select({ n: count() }).from(workspaces).where(eq(workspaces.slug, DEMO_WORKSPACE.slug));
    expect(ws?.n).toBe(1);
    const rows = await db
      .select({ email: users.email, role: memberships.role, hash: users.passwordHash })
      .from(memberships)
      .innerJoin(users, eq(users.id, memberships.userId))
      .where(eq(memberships.workspaceId, first.workspaceId));
    expect(rows.map((r) => [r.email, r.role]).sort()).toEqual(DEMO_PEOPLE.map((p) => [p.email, p.role]).sort());
    expect(new Set(rows.map((r) => r.role))).toEqual(new Set(["owner", "formulator", "buyer", "production", "viewer"]));
    expect(await verifyPassword(rows[0]!.hash, DEMO_PASSWORD)).toBe(true);
  });
});
