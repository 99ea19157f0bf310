"use server";

import { redirect } from "next/navigation";
import { endCurrentSession } from "@/lib/auth/session";

/** Ends this browser's session. Safe to call when already signed out. */
export async function signOutAction(): Promise<void> {
  await endCurrentSession();
  redirect("/sign-in");
}
