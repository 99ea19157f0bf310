/**
 * The role × action matrix for accounts and members, and the check that the
 * rights written out by hand equal lib/auth/permissions.ts. Each feature has its
 * own matrix file (tests/integration/matrix-*.test.ts) built on
 * tests/support/matrix.ts.
 */
import { randomBytes } from "node:crypto";
import { describe, expect, it } from "vitest";
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
import { permissionTable } from "@/lib/auth/permissions";
import { createInvitation } from "@/lib/data/invitations";
import { addMember, createTeam, FIXTURE_PASSWORD, signInAs, uniqueEmail } from "../support/fixtures";
import { base, expectedRights, form, fromResult, fromStatus, jsonRequest, params, runMatrix, type MatrixRow } from "../support/matrix";
import { freshRequest } from "../support/request";

const rows: MatrixRow[] = [
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
    run: async ({ team }) => {
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
    run: async ({ team }) => {
      const m = await addMember(team.workspaceId, "viewer");
      return fromResult(await changeRoleAction({ userId: m.id, role: "buyer" }));
    },
  },
  {
    name: "removeMemberAction",
    permission: "members.manage",
    outsider: "not_found",
    run: async ({ team }) => {
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
    run: async ({ team }) => fromResult(await switchWorkspaceAction({ workspaceId: team.workspaceId })),
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
    run: async ({ team }) =>
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
      fromStatus((await postInvitation(jsonRequest("POST", "/api/invitations", { email: uniqueEmail("api"), role: "buyer" }), params())).status),
  },
];

describe("the permission table", () => {
  it("grants exactly the rights written out in tests/support/matrix.ts, and nothing else", () => {
    expect(permissionTable).toEqual(expectedRights);
  });
});

runMatrix("members", rows);

describe("workspace isolation", () => {
  it("never lists another workspace's people", async () => {
    const team = await createTeam("iso-a");
    const other = await createTeam("iso-b");
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
    const team = await createTeam("csrf");
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
    const team = await createTeam("badjson");
    freshRequest();
    await signInAs(team.people.owner.id, team.workspaceId);
    const malformed = new Request(`${base}/api/invitations`, {
      method: "POST",
      headers: { "content-type": "application/json", origin: base, host: "127.0.0.1:3000" },
      body: "{not json",
    });
    expect((await postInvitation(malformed, params())).status).toBe(400);
    const bad = await postInvitation(jsonRequest("POST", "/api/invitations", { email: "nope", role: "chief" }), params());
    expect(bad.status).toBe(422);
    const body = (await bad.json()) as { error: { fieldErrors: Record<string, string[]> } };
    expect(Object.keys(body.error.fieldErrors).sort()).toEqual(["email", "role"]);
  });
});
