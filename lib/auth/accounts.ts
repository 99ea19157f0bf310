import "server-only";
import { headers } from "next/headers";
import type { Role } from "@/db/schema";
import { AppError, conflict, invalid } from "@/lib/errors";
import { sendMail } from "@/lib/mail/mailer";
import { acceptInvitation, createInvitation, getInvitationByTokenHash } from "@/lib/data/invitations";
import { getMembership, listMembershipsForUser } from "@/lib/data/memberships";
import { consumePasswordReset, createPasswordReset } from "@/lib/data/password-resets";
import { getUserByEmail, getUserById, setPasswordHash } from "@/lib/data/users";
import { createAccountWithWorkspace } from "@/lib/data/workspaces";
import { newPasswordSchema } from "@/lib/validation/auth";
import { appOrigin } from "./origin";
import { hashPassword, verifyPassword } from "./password";
import { clientIp, consume, ensureNotBlocked, reset } from "./rate-limit";
import { endAllSessionsOf, startSession } from "./session";
import { generateToken, hashToken } from "./tokens";

/** One message for an unknown e-mail and a wrong password, so neither reveals the other. */
export const WRONG_CREDENTIALS = "That e-mail and password do not match an account.";
export const INVITATION_DAYS = 7;
export const RESET_MINUTES = 60;

// Verifying against a throw-away hash when the e-mail is unknown keeps both paths equally slow.
let dummyHash: Promise<string> | null = null;
async function burnVerify(password: string) {
  dummyHash ??= hashPassword("no-account-has-this-password");
  await verifyPassword(await dummyHash, password);
}

export async function signIn({ email, password }: { email: string; password: string }): Promise<void> {
  const ip = clientIp(await headers());
  await consume("signInIp", ip);
  await ensureNotBlocked("signInAccount", email);
  const user = await getUserByEmail({ email });
  const ok = user ? await verifyPassword(user.passwordHash, password) : (await burnVerify(password), false);
  if (!user || !ok) {
    await consume("signInAccount", email);
    throw invalid(WRONG_CREDENTIALS);
  }
  await reset("signInAccount", email);
  const [first] = await listMembershipsForUser({ userId: user.id });
  await startSession(user.id, first?.workspaceId ?? null);
}

export async function signUp(input: { name: string; email: string; password: string; workspaceName: string }): Promise<void> {
  if (await getUserByEmail({ email: input.email })) {
    throw invalid("An account with this e-mail already exists. Sign in instead.", {
      email: ["An account with this e-mail already exists."],
    });
  }
  const { userId, workspaceId } = await createAccountWithWorkspace({
    name: input.name,
    email: input.email,
    passwordHash: await hashPassword(input.password),
    workspaceName: input.workspaceName,
  });
  await startSession(userId, workspaceId);
}

/** Always looks the same to the caller, whether or not the e-mail has an account. */
export async function requestPasswordReset({ email }: { email: string }): Promise<void> {
  const ip = clientIp(await headers());
  await consume("resetIp", ip);
  await consume("resetAccount", email);
  const user = await getUserByEmail({ email });
  if (!user) return;
  const token = generateToken();
  await createPasswordReset({
    userId: user.id,
    tokenHash: hashToken(token),
    expiresAt: new Date(Date.now() + RESET_MINUTES * 60_000),
  });
  const link = `${await appOrigin()}/reset-password/${token}`;
  await sendMail({
    to: user.email,
    subject: "Reset your Barwright password",
    text: `Hello ${user.name},\n\nSomeone asked to reset the password of your Barwright account. If it was you, open this link within ${RESET_MINUTES} minutes:\n\n${link}\n\nIf it was not you, ignore this message; your password stays as it is.\n`,
  });
}

/** Sets a new password from a reset link, and ends every session of that user. */
export async function resetPassword({ token, password }: { token: string; password: string }): Promise<void> {
  const { userId } = await consumePasswordReset({ tokenHash: hashToken(token), passwordHash: await hashPassword(password) });
  await endAllSessionsOf(userId);
}

/** Changes the signed-in user's password, ends all their sessions, and starts a fresh one here. */
export async function changePassword(input: {
  userId: string;
  workspaceId: string;
  currentPassword: string;
  newPassword: string;
}): Promise<void> {
  const user = await getUserById({ userId: input.userId });
  if (!user || !(await verifyPassword(user.passwordHash, input.currentPassword))) {
    throw invalid("Your current password is not right.", { currentPassword: ["Your current password is not right."] });
  }
  await setPasswordHash({ userId: user.id, passwordHash: await hashPassword(input.newPassword) });
  await endAllSessionsOf(user.id);
  await startSession(user.id, input.workspaceId);
}

export async function inviteMember(input: {
  workspaceId: string;
  workspaceName: string;
  invitedBy: { id: string; name: string };
  email: string;
  role: Role;
}): Promise<{ invitationId: string }> {
  const existing = await getUserByEmail({ email: input.email });
  if (existing && (await getMembership({ userId: existing.id, workspaceId: input.workspaceId }))) {
    throw conflict(`${input.email} is already a member of this workspace.`);
  }
  const token = generateToken();
  const { id } = await createInvitation({
    workspaceId: input.workspaceId,
    email: input.email,
    role: input.role,
    tokenHash: hashToken(token),
    invitedById: input.invitedBy.id,
    expiresAt: new Date(Date.now() + INVITATION_DAYS * 24 * 60 * 60_000),
  });
  const link = `${await appOrigin()}/invitations/${token}`;
  try {
    await sendMail({
      to: input.email,
      subject: `${input.invitedBy.name} invites you to ${input.workspaceName} on Barwright`,
      text: `Hello,\n\n${input.invitedBy.name} invites you to join ${input.workspaceName} on Barwright as ${input.role}.\n\nOpen this link within ${INVITATION_DAYS} days to accept:\n\n${link}\n`,
    });
  } catch {
    throw new AppError("unavailable", "The invitation was saved but the e-mail could not be sent. Revoke it and try again.");
  }
  return { invitationId: id };
}

/**
 * Accepts an invitation from its link. A visitor with no account gives a name
 * and a new password; one with an account gives its password. Either way they
 * end up signed in, in the invited workspace.
 */
export async function acceptInvitationWithToken(input: { token: string; name?: string; password: string }): Promise<void> {
  const inv = await getInvitationByTokenHash({ tokenHash: hashToken(input.token) });
  if (!inv) throw invalid("This invitation link is not valid.");
  if (inv.state !== "pending") throw conflict(invitationStateMessage(inv.state));
  const user = await getUserByEmail({ email: inv.email });
  let userId: string;
  if (user) {
    if (!(await verifyPassword(user.passwordHash, input.password))) {
      throw invalid(WRONG_CREDENTIALS, { password: [WRONG_CREDENTIALS] });
    }
    ({ userId } = await acceptInvitation({ invitationId: inv.id, userId: user.id }));
  } else {
    const pw = newPasswordSchema.safeParse(input.password);
    const name = input.name?.trim();
    if (!name || !pw.success) {
      throw invalid("Check the highlighted fields.", {
        name: name ? undefined : ["Enter your name."],
        password: pw.success ? undefined : pw.error.issues.map((i) => i.message),
      });
    }
    ({ userId } = await acceptInvitation({
      invitationId: inv.id,
      newUser: { name, email: inv.email, passwordHash: await hashPassword(input.password) },
    }));
  }
  await startSession(userId, inv.workspaceId);
}

export function invitationStateMessage(state: "pending" | "expired" | "revoked" | "accepted"): string {
  switch (state) {
    case "expired":
      return "This invitation has expired. Ask the workspace owner for a new one.";
    case "revoked":
      return "This invitation was withdrawn by the workspace owner.";
    case "accepted":
      return "This invitation has already been used. Sign in instead.";
    default:
      return "This invitation is waiting to be accepted.";
  }
}
