"use server";

import { redirect } from "next/navigation";
import { revalidatePath } from "next/cache";
import { fieldErrorsOf, toFailure, type ActionResult } from "@/lib/actions/define-action";
import { getCurrentSession, endAllSessionsOf, endCurrentSession } from "@/lib/auth/session";
import { getMembership } from "@/lib/data/memberships";
import { setActiveWorkspace } from "@/lib/data/sessions";
import { notFound, unauthenticated } from "@/lib/errors";
import { switchWorkspaceSchema } from "@/lib/validation/auth";

/** Ends this browser's session. Safe to call when already signed out. */
export async function signOutAction(): Promise<void> {
  await endCurrentSession();
  redirect("/sign-in");
}

/** Ends every session of the signed-in user, on every device. */
export async function signOutEverywhereAction(): Promise<void> {
  const { user } = await getCurrentSession();
  if (user) await endAllSessionsOf(user.id);
  await endCurrentSession();
  redirect("/sign-in");
}

/** Makes another workspace the active one; the user must be a member of it. */
export async function switchWorkspaceAction(input: unknown): Promise<ActionResult<void>> {
  try {
    const parsed = switchWorkspaceSchema.safeParse(input);
    if (!parsed.success) return { ok: false, code: "invalid", message: "Unknown workspace.", fieldErrors: fieldErrorsOf(parsed.error) };
    const { user, session } = await getCurrentSession();
    if (!user || !session) throw unauthenticated();
    const membership = await getMembership({ userId: user.id, workspaceId: parsed.data.workspaceId });
    if (!membership) throw notFound("That workspace");
    await setActiveWorkspace({ sessionId: session.id, userId: user.id, workspaceId: membership.workspaceId });
    revalidatePath("/", "layout");
    return { ok: true, data: undefined };
  } catch (err) {
    return toFailure(err);
  }
}
