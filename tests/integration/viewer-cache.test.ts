/**
 * The few-second viewer cache of route handlers and server actions
 * (lib/auth/viewer-cache.ts): what this process changes takes effect at once,
 * what another process changes within VIEWER_TTL_MS, and pages never use it.
 */
import { eq } from "drizzle-orm";
import { afterEach, beforeEach, describe, expect, it, vi } from "vitest";
import { signOutAction, signOutEverywhereAction, switchWorkspaceAction } from "@/app/(app)/actions";
import { changeRoleAction, removeMemberAction } from "@/app/(app)/settings/members/actions";
import { GET as listRecipes } from "@/app/api/recipes/route";
import { db } from "@/db/client";
import { memberships, sessions } from "@/db/schema";
import { authorize } from "@/lib/auth/authorize";
import { getViewer } from "@/lib/auth/current";
import { lucia } from "@/lib/auth/lucia";
import { authSettings } from "@/lib/auth/settings";
import { hashToken } from "@/lib/auth/tokens";
import { forgetAllViewers, VIEWER_TTL_MS } from "@/lib/auth/viewer-cache";
import { addMember, createTeam, signInAs, type TeamFixture } from "../support/fixtures";
import { freshRequest, requestState } from "../support/request";

const ignoreRedirect = (p: Promise<unknown>) => p.catch((err: { digest?: string }) => {
  if (!String(err.digest ?? "").startsWith("NEXT_REDIRECT")) throw err;
});
const use = (token: string) => {
  freshRequest();
  requestState.cookieStore.set(lucia.sessionCookieName, token);
};
const listStatus = async () => (await listRecipes(new Request("http://127.0.0.1:3000/api/recipes"), { params: Promise.resolve({}) })).status;

let team: TeamFixture;
beforeEach(async () => {
  forgetAllViewers();
  team = await createTeam("viewer-cache");
});
afterEach(() => vi.useRealTimers());

describe("the viewer cache of route handlers and actions", () => {
  it("answers from the cache within the TTL: a session deleted by another process still works until it runs out", async () => {
    const token = await signInAs(team.people.formulator.id, team.workspaceId);
    expect(await listStatus()).toBe(200);
    // Another server process signs this session out: this process has not heard.
    await db.delete(sessions).where(eq(sessions.id, hashToken(token)));
    use(token);
    expect(await listStatus()).toBe(200);
    // Pages always check afresh.
    expect(await getViewer()).toBeNull();
    vi.useFakeTimers({ toFake: ["Date"], now: Date.now() + VIEWER_TTL_MS });
    use(token);
    expect(await listStatus()).toBe(401);
  });

  it("forgets a session signed out in this process at once", async () => {
    const token = await signInAs(team.people.formulator.id, team.workspaceId);
    expect(await listStatus()).toBe(200);
    await ignoreRedirect(signOutAction());
    use(token);
    expect(await listStatus()).toBe(401);
  });

  it("forgets every session of someone who signs out everywhere", async () => {
    const phone = await signInAs(team.people.formulator.id, team.workspaceId);
    expect(await listStatus()).toBe(200);
    const laptop = await signInAs(team.people.formulator.id, team.workspaceId);
    expect(await listStatus()).toBe(200);
    await ignoreRedirect(signOutEverywhereAction());
    use(phone);
    expect(await listStatus()).toBe(401);
    use(laptop);
    expect(await listStatus()).toBe(401);
  });

  it("takes a role change and a removal at once", async () => {
    const member = await addMember(team.workspaceId, "formulator");
    const token = await signInAs(member.id, team.workspaceId);
    expect((await authorize("recipes.edit")).role).toBe("formulator");

    await signInAs(team.people.owner.id, team.workspaceId);
    expect(await changeRoleAction({ userId: member.id, role: "viewer" })).toMatchObject({ ok: true });
    use(token);
    await expect(authorize("recipes.edit")).rejects.toMatchObject({ code: "forbidden" });
    expect((await authorize("recipes.readReleased")).role).toBe("viewer");

    await signInAs(team.people.owner.id, team.workspaceId);
    expect(await removeMemberAction({ userId: member.id })).toMatchObject({ ok: true });
    expect(await db.select().from(memberships).where(eq(memberships.userId, member.id))).toEqual([]);
    use(token);
    await expect(authorize("recipes.readReleased")).rejects.toMatchObject({ code: "unauthenticated" });
  });

  it("follows a workspace switch at once", async () => {
    const other = await createTeam("viewer-cache-other");
    await db.insert(memberships).values({ workspaceId: other.workspaceId, userId: team.people.buyer.id, role: "buyer" });
    await signInAs(team.people.buyer.id, team.workspaceId);
    expect((await authorize("recipes.read")).workspace.id).toBe(team.workspaceId);
    expect(await switchWorkspaceAction({ workspaceId: other.workspaceId })).toMatchObject({ ok: true });
    expect((await authorize("recipes.read")).workspace.id).toBe(other.workspaceId);
  });

  it("never outlives the session's absolute lifetime", async () => {
    const token = await signInAs(team.people.formulator.id, team.workspaceId);
    // One second left of the 7-day limit (lib/auth/settings.ts).
    const createdAt = new Date(Date.now() - authSettings.absoluteLifetimeMinutes * 60_000 + 1_000);
    await db.update(sessions).set({ createdAt }).where(eq(sessions.id, hashToken(token)));
    expect(await listStatus()).toBe(200);
    vi.useFakeTimers({ toFake: ["Date"], now: Date.now() + 1_000 });
    use(token);
    expect(await listStatus()).toBe(401);
  });
});
