"use server";

import { redirect } from "next/navigation";
import { hashPassword, verifyPassword } from "@/lib/auth/password";
import { startSession } from "@/lib/auth/session";
import { listMembershipsForUser } from "@/lib/data/memberships";
import { getUserByEmail } from "@/lib/data/users";
import { formToObject, type FormState } from "@/lib/actions/result";
import { signInSchema } from "@/lib/validation/auth";

const WRONG = "That e-mail and password do not match an account.";

// Verifying against a throw-away hash when the e-mail is unknown keeps both paths equally slow.
let dummyHash: Promise<string> | null = null;

export async function signInAction(_prev: FormState, formData: FormData): Promise<FormState> {
  const parsed = signInSchema.safeParse(formToObject(formData));
  if (!parsed.success) {
    return { ok: false, message: "Check the highlighted fields.", fieldErrors: parsed.error.flatten().fieldErrors };
  }
  const { email, password } = parsed.data;
  const user = await getUserByEmail({ email });
  if (!user) {
    dummyHash ??= hashPassword("not-a-real-password");
    await verifyPassword(await dummyHash, password);
    return { ok: false, message: WRONG };
  }
  if (!(await verifyPassword(user.passwordHash, password))) return { ok: false, message: WRONG };
  const [first] = await listMembershipsForUser({ userId: user.id });
  await startSession(user.id, first?.workspaceId ?? null);
  redirect("/overview");
}
