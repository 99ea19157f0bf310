import { randomBytes } from "node:crypto";
import { and, eq } from "drizzle-orm";
import { beforeEach, describe, expect, it } from "vitest";
import { signOutEverywhereAction } from "@/app/(app)/actions";
import { removeMemberAction, revokeInvitationAction, inviteMemberAction } from "@/app/(app)/settings/members/actions";
import { changePasswordAction } from "@/app/(app)/settings/account/actions";
import { requestResetAction } from "@/app/(marketing)/forgot-password/actions";
import { acceptInvitationAction } from "@/app/(marketing)/invitations/[token]/actions";
import { resetPasswordAction } from "@/app/(marketing)/reset-password/[token]/actions";
import { signInAction } from "@/app/(marketing)/sign-in/actions";
import { signUpAction } from "@/app/(marketing)/sign-up/actions";
import { db } from "@/db/client";
import { invitations, memberships, passwordResets, sessions, users } from "@/db/schema";
import { getViewer } from "@/lib/auth/current";
import { lucia } from "@/lib/auth/lucia";
import { generateToken, hashToken } from "@/lib/auth/tokens";
import { countSessionsOf } from "@/lib/data/sessions";
import { mailSinks } from "../support/clusters";
import { addMember, createTeam, FIXTURE_PASSWORD, signInAs, uniqueEmail } from "../support/fixtures";
import { latestMailTo, tokenFromMail } from "../support/mailbox";
import { freshRequest, requestState } from "../support/request";

const form = (o: Record<string, string>) => {
  const f = new FormData();
  for (const [k, v] of Object.entries(o)) f.set(k, v);
  f.set("$ACTION_ID_abc", ""); // what a real form post carries; must be ignored
  return f;
};
/** Runs an action that may redirect; returns its result or the redirect target. */
async function run<T>(p: Promise<T>): Promise<T | { redirect: string }> {
  try {
    return await p;
  } catch (err) {
    const digest = (err as { digest?: string }).digest ?? "";
    if (digest.startsWith("NEXT_REDIRECT")) return { redirect: digest.split(";")[2]! };
    throw err;
  }
}
const newIp = () => `10.${randomBytes(1)[0]}.${randomBytes(1)[0]}.${randomBytes(1)[0]}`;
const sessionCookie = () => requestState.cookieStore.get(lucia.sessionCookieName)?.value;

beforeEach(() => freshRequest(newIp()));

describe("sign-up", () => {
  it("creates the user, a workspace they own, and a session, then goes to the overview", async () => {
    const email = uniqueEmail("Founder").toUpperCase();
    const r = await run(signUpAction(null, form({ name: "Ada Founder", email, password: "winnowing-by-hand-42", workspaceName: "Kestrel Cocoa" })));
    expect(r).toEqual({ redirect: "/overview" });
    const [u] = await db.select().from(users).where(eq(users.email, email.toLowerCase()));
    expect(u).toBeTruthy();
    const [m] = await db.select().from(memberships).where(eq(memberships.userId, u!.id));
    expect(m?.role).toBe("owner");
    const viewer = await getViewer();
    expect(viewer?.workspace.name).toBe("Kestrel Cocoa");
    // Only the hash of the cookie's token is in the database.
    const token = sessionCookie()!;
    const stored = await db.select().from(sessions).where(eq(sessions.userId, u!.id));
    expect(stored.map((s) => s.id)).toEqual([hashToken(token)]);
    expect(stored.some((s) => s.id === token)).toBe(false);
  });

  it.each([
    [{ name: "A", email: "not-an-email", password: "winnowing-by-hand-42", workspaceName: "Kestrel" }, "email", /valid e-mail/],
    [{ name: "A", email: uniqueEmail("a"), password: "short", workspaceName: "Kestrel" }, "password", /at least 12/],
    [{ name: "A", email: uniqueEmail("a"), password: "chocolate1234", workspaceName: "Kestrel" }, "password", /too common/],
    [{ name: "A", email: uniqueEmail("a"), password: "x".repeat(257), workspaceName: "Kestrel" }, "password", /at most 256/],
    [{ name: "n".repeat(121), email: uniqueEmail("a"), password: "winnowing-by-hand-42", workspaceName: "Kestrel" }, "name", /at most 120/],
    [{ name: "A", email: `${"e".repeat(250)}@x.example`, password: "winnowing-by-hand-42", workspaceName: "Kestrel" }, "email", /too long/],
  ])("rejects bad input with a field message (%#)", async (input, field, message) => {
    const r = await run(signUpAction(null, form(input)));
    expect(r).toMatchObject({ ok: false, code: "invalid" });
    expect((r as { fieldErrors: Record<string, string[]> }).fieldErrors[field]?.join(" ")).toMatch(message);
  });

  it("refuses an e-mail that already has an account", async () => {
    const team = await createTeam("dup");
    const r = await run(signUpAction(null, form({ name: "B", email: team.people.viewer.email, password: "winnowing-by-hand-42", workspaceName: "K2" })));
    expect(r).toMatchObject({ ok: false, fieldErrors: { email: ["An account with this e-mail already exists."] } });
  });
});

describe("sign-in", () => {
  it("gives the same message for an unknown e-mail and a wrong password", async () => {
    const team = await createTeam("signin");
    const unknown = await run(signInAction(null, form({ email: uniqueEmail("ghost"), password: FIXTURE_PASSWORD })));
    const wrong = await run(signInAction(null, form({ email: team.people.buyer.email, password: "not-the-password" })));
    expect(unknown).toEqual(wrong);
    expect(wrong).toMatchObject({ ok: false, message: "That e-mail and password do not match an account." });
  });

  it("creates a new session at every sign-in", async () => {
    const team = await createTeam("fresh");
    expect(await run(signInAction(null, form({ email: team.people.buyer.email, password: FIXTURE_PASSWORD })))).toEqual({ redirect: "/overview" });
    const first = sessionCookie();
    freshRequest(newIp());
    await run(signInAction(null, form({ email: team.people.buyer.email, password: FIXTURE_PASSWORD })));
    expect(sessionCookie()).not.toBe(first);
    expect(await countSessionsOf({ userId: team.people.buyer.id })).toBe(2);
  });

  it("locks an account after 5 wrong passwords, even for the right one, with a wait message", async () => {
    const team = await createTeam("brute");
    for (let i = 0; i < 5; i++) {
      freshRequest(newIp()); // different addresses: the per-account limit still applies
      expect(await run(signInAction(null, form({ email: team.people.viewer.email, password: `guess-${i}` })))).toMatchObject({ code: "invalid" });
    }
    const r = await run(signInAction(null, form({ email: team.people.viewer.email, password: FIXTURE_PASSWORD })));
    expect(r).toMatchObject({ ok: false, code: "rate_limited" });
    expect((r as { message: string }).message).toMatch(/Too many attempts\. Wait \d+ minutes? and try again\./);
  });

  it("limits one address trying many accounts", async () => {
    const ip = newIp();
    let last: unknown;
    for (let i = 0; i < 51; i++) {
      freshRequest(ip);
      last = await run(signInAction(null, form({ email: uniqueEmail(`spray${i}`), password: "whatever-password" })));
    }
    expect(last).toMatchObject({ code: "rate_limited" });
  });
});

describe("sessions", () => {
  it("ends a session past its absolute lifetime even while it is still active", async () => {
    const team = await createTeam("old");
    const token = generateToken();
    await db.insert(sessions).values({
      id: hashToken(token),
      userId: team.people.owner.id,
      activeWorkspaceId: team.workspaceId,
      expiresAt: new Date(Date.now() + 3_600_000),
      createdAt: new Date(Date.now() - 8 * 24 * 3_600_000), // 8 days: past the 7-day limit
    });
    requestState.cookieStore.set(lucia.sessionCookieName, token);
    expect(await getViewer()).toBeNull();
    expect(await db.select().from(sessions).where(eq(sessions.id, hashToken(token)))).toEqual([]);
  });

  it("ends a session after its idle timeout", async () => {
    const team = await createTeam("idle");
    const token = generateToken();
    await db.insert(sessions).values({
      id: hashToken(token),
      userId: team.people.owner.id,
      activeWorkspaceId: team.workspaceId,
      expiresAt: new Date(Date.now() - 1000),
      createdAt: new Date(Date.now() - 13 * 3_600_000),
    });
    requestState.cookieStore.set(lucia.sessionCookieName, token);
    expect(await getViewer()).toBeNull();
  });

  it("signs out everywhere: every session of the user is deleted", async () => {
    const team = await createTeam("everywhere");
    await signInAs(team.people.formulator.id, team.workspaceId);
    await signInAs(team.people.formulator.id, team.workspaceId);
    expect(await countSessionsOf({ userId: team.people.formulator.id })).toBe(2);
    expect(await run(signOutEverywhereAction())).toEqual({ redirect: "/sign-in" });
    expect(await countSessionsOf({ userId: team.people.formulator.id })).toBe(0);
  });

  it("removing a member deletes that member's sessions", async () => {
    const team = await createTeam("removal");
    const member = await addMember(team.workspaceId, "buyer");
    await signInAs(member.id, team.workspaceId);
    freshRequest();
    await signInAs(team.people.owner.id, team.workspaceId);
    expect(await removeMemberAction({ userId: member.id })).toMatchObject({ ok: true });
    expect(await countSessionsOf({ userId: member.id })).toBe(0);
  });

  it("a password change ends the user's other sessions and keeps this one", async () => {
    const team = await createTeam("pwchange");
    await signInAs(team.people.buyer.id, team.workspaceId);
    freshRequest();
    await signInAs(team.people.buyer.id, team.workspaceId);
    const wrong = await changePasswordAction(null, form({ currentPassword: "nope", newPassword: "roasted-at-132-celsius" }));
    expect(wrong).toMatchObject({ ok: false, fieldErrors: { currentPassword: ["Your current password is not right."] } });
    const r = await changePasswordAction(null, form({ currentPassword: FIXTURE_PASSWORD, newPassword: "roasted-at-132-celsius" }));
    expect(r).toMatchObject({ ok: true });
    expect(await countSessionsOf({ userId: team.people.buyer.id })).toBe(1);
    expect((await getViewer())?.user.id).toBe(team.people.buyer.id);
  });

  it("a removed member keeps no way into the workspace, and the last owner cannot be removed", async () => {
    const team = await createTeam("lastowner");
    await signInAs(team.people.owner.id, team.workspaceId);
    const r = await removeMemberAction({ userId: team.people.owner.id });
    expect(r).toMatchObject({ ok: false, code: "conflict", message: "The last owner cannot be removed." });
  });
});

describe("password reset", () => {
  it("mails a single-use link that sets a new password and ends old sessions", async () => {
    const team = await createTeam("reset");
    const who = team.people.production;
    await signInAs(who.id, team.workspaceId);
    freshRequest(newIp());
    expect(await requestResetAction(null, form({ email: who.email }))).toMatchObject({ ok: true });
    const mail = latestMailTo(mailSinks.integration.dir, who.email);
    expect(mail?.subject).toBe("Reset your Barwright password");
    const token = tokenFromMail(mail!, "reset-password");
    const [stored] = await db.select().from(passwordResets).where(eq(passwordResets.userId, who.id));
    expect(stored?.tokenHash).toBe(hashToken(token));

    expect(await resetPasswordAction(null, form({ token, password: "tempered-at-31-degrees" }))).toMatchObject({ ok: true });
    expect(await countSessionsOf({ userId: who.id })).toBe(0);
    expect(await run(signInAction(null, form({ email: who.email, password: "tempered-at-31-degrees" })))).toEqual({ redirect: "/overview" });

    const again = await resetPasswordAction(null, form({ token, password: "another-good-password" }));
    expect(again).toMatchObject({ ok: false, message: "This reset link has already been used or has expired. Ask for a new one." });
  });

  it("answers the same for an unknown address, and sends nothing", async () => {
    const ghost = uniqueEmail("ghost");
    expect(await requestResetAction(null, form({ email: ghost }))).toMatchObject({ ok: true });
    expect(latestMailTo(mailSinks.integration.dir, ghost)).toBeNull();
  });

  it("refuses an expired link with a clear message", async () => {
    const team = await createTeam("expired");
    const token = generateToken();
    await db.insert(passwordResets).values({ userId: team.people.viewer.id, tokenHash: hashToken(token), expiresAt: new Date(Date.now() - 1) });
    const r = await resetPasswordAction(null, form({ token, password: "another-good-password" }));
    expect(r).toMatchObject({ ok: false, code: "conflict" });
  });

  it("rate-limits reset requests per account", async () => {
    const email = uniqueEmail("flood");
    let last: unknown;
    for (let i = 0; i < 4; i++) {
      freshRequest(newIp());
      last = await requestResetAction(null, form({ email }));
    }
    expect(last).toMatchObject({ ok: false, code: "rate_limited" });
  });
});

describe("invitations", () => {
  it("invites by e-mail; the link creates an account and a membership with the role, once", async () => {
    const team = await createTeam("invite");
    await signInAs(team.people.owner.id, team.workspaceId);
    const email = uniqueEmail("newbuyer");
    expect(await inviteMemberAction(null, form({ email, role: "buyer" }))).toMatchObject({ ok: true });
    const mail = latestMailTo(mailSinks.integration.dir, email)!;
    expect(mail.subject).toBe("invite owner invites you to invite works on Barwright");
    const token = tokenFromMail(mail, "invitations");

    freshRequest(newIp());
    const weak = await run(acceptInvitationAction(null, form({ token, name: "New Buyer", password: "short" })));
    expect(weak).toMatchObject({ ok: false, fieldErrors: { password: ["Use at least 12 characters."] } });
    const r = await run(acceptInvitationAction(null, form({ token, name: "New Buyer", password: "cracked-and-winnowed" })));
    expect(r).toEqual({ redirect: "/overview" });
    const viewer = await getViewer();
    expect(viewer).toMatchObject({ role: "buyer", workspace: { id: team.workspaceId }, user: { email } });

    freshRequest(newIp());
    const reuse = await run(acceptInvitationAction(null, form({ token, name: "Again", password: "cracked-and-winnowed" })));
    expect(reuse).toMatchObject({ ok: false, code: "conflict", message: "This invitation has already been used. Sign in instead." });
  });

  it("links an existing account after checking its password", async () => {
    const team = await createTeam("link");
    const elsewhere = await createTeam("linked");
    await signInAs(team.people.owner.id, team.workspaceId);
    const email = elsewhere.people.viewer.email;
    await inviteMemberAction(null, form({ email, role: "formulator" }));
    const token = tokenFromMail(latestMailTo(mailSinks.integration.dir, email)!, "invitations");
    freshRequest(newIp());
    expect(await run(acceptInvitationAction(null, form({ token, password: "wrong-password-here" })))).toMatchObject({ ok: false, code: "invalid" });
    expect(await run(acceptInvitationAction(null, form({ token, password: FIXTURE_PASSWORD })))).toEqual({ redirect: "/overview" });
    const rows = await db.select().from(memberships).where(eq(memberships.userId, elsewhere.people.viewer.id));
    expect(rows.map((m) => m.role).sort()).toEqual(["formulator", "viewer"]);
  });

  it("refuses a revoked or expired invitation with a clear message", async () => {
    const team = await createTeam("revoked");
    await signInAs(team.people.owner.id, team.workspaceId);
    const email = uniqueEmail("withdrawn");
    await inviteMemberAction(null, form({ email, role: "viewer" }));
    const token = tokenFromMail(latestMailTo(mailSinks.integration.dir, email)!, "invitations");
    const [inv] = await db.select().from(invitations).where(and(eq(invitations.workspaceId, team.workspaceId), eq(invitations.email, email)));
    expect(await revokeInvitationAction({ invitationId: inv!.id })).toMatchObject({ ok: true });
    freshRequest(newIp());
    expect(await run(acceptInvitationAction(null, form({ token, name: "X", password: "cracked-and-winnowed" })))).toMatchObject({
      message: "This invitation was withdrawn by the workspace owner.",
    });

    const expiredToken = generateToken();
    await db.insert(invitations).values({
      workspaceId: team.workspaceId,
      email: uniqueEmail("late"),
      role: "viewer",
      tokenHash: hashToken(expiredToken),
      expiresAt: new Date(Date.now() - 1),
    });
    expect(await run(acceptInvitationAction(null, form({ token: expiredToken, name: "X", password: "cracked-and-winnowed" })))).toMatchObject({
      message: "This invitation has expired. Ask the workspace owner for a new one.",
    });
    expect(await run(acceptInvitationAction(null, form({ token: "not a token!", password: "x" })))).toMatchObject({
      fieldErrors: { token: ["This link is not valid."] },
    });
  });

  it("refuses to invite someone who is already a member", async () => {
    const team = await createTeam("already");
    await signInAs(team.people.owner.id, team.workspaceId);
    const r = await inviteMemberAction(null, form({ email: team.people.buyer.email, role: "viewer" }));
    expect(r).toMatchObject({ ok: false, code: "conflict" });
  });
});
