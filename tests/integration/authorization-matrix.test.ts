/**
 * The role × action matrix: every server action and route handler, called by
 * each of the five roles, a signed-out visitor, and the owner of another
 * workspace. Expected outcomes are written out here by hand and must agree with
 * lib/auth/permissions.ts. Each later feature adds its rows to `rows`.
 */
import { randomBytes } from "node:crypto";
import { beforeAll, beforeEach, describe, expect, it } from "vitest";
import { GET as getInvitations, POST as postInvitation } from "@/app/api/invitations/route";
import { GET as getMember } from "@/app/api/members/[userId]/route";
import { GET as getMembers } from "@/app/api/members/route";
import { switchWorkspaceAction } from "@/app/(app)/actions";
import { changePasswordAction } from "@/app/(app)/settings/account/actions";
import {
  changeRoleAction,
  inviteMemberAction,
  removeMemberAction,
  revokeInvitationAction,
} from "@/app/(app)/settings/members/actions";
import { roles, type Role } from "@/db/schema";
import { can, permissionTable, type Permission } from "@/lib/auth/permissions";
import { createInvitation } from "@/lib/data/invitations";
import { addMember, createTeam, FIXTURE_PASSWORD, signInAs, uniqueEmail, type TeamFixture } from "../support/fixtures";
import { freshRequest } from "../support/request";

type Caller = Role | "signed-out" | "outsider";
type Outcome = "ok" | "unauthenticated" | "forbidden" | "not_found" | "invalid" | "conflict" | "error" | string;

// The rights as the product defines them (lib/auth/permissions.ts must say the same).
const expectedRights: Record<Permission, Role[]> = {
  "workspace.read": ["owner", "formulator", "buyer", "production", "viewer"],
  "account.manage": ["owner", "formulator", "buyer", "production", "viewer"],
  "members.manage": ["owner"],
};

let team: TeamFixture;
let other: TeamFixture;

const base = "http://127.0.0.1:3000";
const params = (p: Record<string, string> = {}) => ({ params: Promise.resolve(p) });
const jsonPost = (url: string, body: unknown) =>
  new Request(url, {
    method: "POST",
    headers: { "content-type": "application/json", origin: base, host: "127.0.0.1:3000", "sec-fetch-site": "same-origin" },
    body: JSON.stringify(body),
  });
const fromStatus = (s: number): Outcome =>
  ({ 200: "ok", 401: "unauthenticated", 403: "forbidden", 404: "not_found", 409: "conflict", 422: "invalid" })[s] ?? `http ${s}`;
const fromResult = (r: { ok: boolean; code?: string }): Outcome => (r.ok ? "ok" : (r.code ?? "error"));
const form = (o: Record<string, string>) => {
  const f = new FormData();
  for (const [k, v] of Object.entries(o)) f.set(k, v);
  return f;
};

type Row = {
  name: string;
  permission: Permission;
  /** What the owner of another workspace gets when aiming at this workspace's rows. */
  outsider: "ok" | "not_found";
  run: () => Promise<Outcome>;
};

const rows: Row[] = [
  {
    name: "inviteMemberAction",
    permission: "members.manage",
    outsider: "ok", // invites into the outsider's own workspace: no row of ours is touched
    run: async () => fromResult(await inviteMemberAction(null, form({ email: uniqueEmail("invitee"), role: "viewer" }))),
  },
  {
    name: "revokeInvitationAction",
    permission: "members.manage",
    outsider: "not_found",
    run: async () => {
      const inv = await createInvitation({
        workspaceId: team.workspaceId,
        email: uniqueEmail("revokee"),
        role: "viewer",
        tokenHash: randomBytes(32).toString("hex"),
        invitedById: team.people.owner.id,
        expiresAt: new Date(Date.now() + 86_400_000),
      });
      return fromResult(await revokeInvitationAction({ invitationId: inv.id }));
    },
  },
  {
    name: "changeRoleAction",
    permission: "members.manage",
    outsider: "not_found",
    run: async () => {
      const m = await addMember(team.workspaceId, "viewer");
      return fromResult(await changeRoleAction({ userId: m.id, role: "buyer" }));
    },
  },
  {
    name: "removeMemberAction",
    permission: "members.manage",
    outsider: "not_found",
    run: async () => {
      const m = await addMember(team.workspaceId, "viewer");
      return fromResult(await removeMemberAction({ userId: m.id }));
    },
  },
  {
    name: "changePasswordAction",
    permission: "account.manage",
    outsider: "ok", // one's own account
    run: async () =>
      fromResult(await changePasswordAction(null, form({ currentPassword: FIXTURE_PASSWORD, newPassword: "conching-overnight-72h" }))),
  },
  {
    name: "switchWorkspaceAction (to this workspace)",
    permission: "workspace.read",
    outsider: "not_found",
    run: async () => fromResult(await switchWorkspaceAction({ workspaceId: team.workspaceId })),
  },
  {
    name: "GET /api/members",
    permission: "workspace.read",
    outsider: "ok", // lists the outsider's own people; checked below that none of ours appear
    run: async () => fromStatus((await getMembers(new Request(`${base}/api/members`), params())).status),
  },
  {
    name: "GET /api/members/:userId",
    permission: "workspace.read",
    outsider: "not_found",
    run: async () =>
      fromStatus((await getMember(new Request(`${base}/api/members/x`), params({ userId: team.people.viewer.id }))).status),
  },
  {
    name: "GET /api/invitations",
    permission: "members.manage",
    outsider: "ok",
    run: async () => fromStatus((await getInvitations(new Request(`${base}/api/invitations`), params())).status),
  },
  {
    name: "POST /api/invitations",
    permission: "members.manage",
    outsider: "ok",
    run: async () =>
      fromStatus((await postInvitation(jsonPost(`${base}/api/invitations`, { email: uniqueEmail("api"), role: "buyer" }), params())).status),
  },
];

const callers: Caller[] = [...roles, "signed-out", "outsider"];

beforeAll(async () => {
  team = await createTeam("matrix");
  other = await createTeam("elsewhere");
});

describe("the permission table", () => {
  it("grants exactly the rights written in this test, and nothing else", () => {
    expect(permissionTable).toEqual(expectedRights);
  });
});

describe.each(rows)("$name", (row) => {
  beforeEach(() => freshRequest());

  it.each(callers)("as %s", async (caller) => {
    if (caller === "outsider") await signInAs(other.people.owner.id, other.workspaceId);
    else if (caller !== "signed-out") await signInAs(team.people[caller].id, team.workspaceId);

    const expected: Outcome =
      caller === "signed-out"
        ? "unauthenticated"
        : caller === "outsider"
          ? can("owner", row.permission)
            ? row.outsider
            : "forbidden"
          : expectedRights[row.permission].includes(caller)
            ? "ok"
            : "forbidden";
    expect(await row.run()).toBe(expected);
  });
});

describe("workspace isolation", () => {
  it("never lists another workspace's people", async () => {
    freshRequest();
    await signInAs(other.people.owner.id, other.workspaceId);
    const body = (await (await getMembers(new Request(`${base}/api/members`), params())).json()) as {
      members: { userId: string }[];
    };
    const ours = new Set(Object.values(team.people).map((p) => p.id));
    expect(body.members.length).toBe(5);
    expect(body.members.some((m) => ours.has(m.userId))).toBe(false);
  });

  it("refuses a cross-site POST to a route handler before it reads the session", async () => {
    freshRequest();
    await signInAs(team.people.owner.id, team.workspaceId);
    const req = new Request(`${base}/api/invitations`, {
      method: "POST",
      headers: { "content-type": "application/json", origin: "http://evil.example", host: "127.0.0.1:3000", "sec-fetch-site": "cross-site" },
      body: JSON.stringify({ email: uniqueEmail("csrf"), role: "owner" }),
    });
    const res = await postInvitation(req, params());
    expect(res.status).toBe(403);
    expect(((await res.json()) as { error: { code: string } }).error.code).toBe("cross_origin");
  });

  it("answers malformed JSON with 400 and invalid fields with 422, never 500", async () => {
    freshRequest();
    await signInAs(team.people.owner.id, team.workspaceId);
    const malformed = new Request(`${base}/api/invitations`, {
      method: "POST",
      headers: { "content-type": "application/json", origin: base, host: "127.0.0.1:3000" },
      body: "{not json",
    });
    expect((await postInvitation(malformed, params())).status).toBe(400);
    const bad = await postInvitation(jsonPost(`${base}/api/invitations`, { email: "nope", role: "chief" }), params());
    expect(bad.status).toBe(422);
    const body = (await bad.json()) as { error: { fieldErrors: Record<string, string[]> } };
    expect(Object.keys(body.error.fieldErrors).sort()).toEqual(["email", "role"]);
  });
});
