"use server";

import { redirect } from "next/navigation";
import { definePublicAction } from "@/lib/actions/define-action";
import { signIn } from "@/lib/auth/accounts";
import { signInSchema } from "@/lib/validation/auth";

export const signInAction = definePublicAction({
  schema: signInSchema,
  handler: async (input) => {
    await signIn(input);
    redirect("/overview");
  },
});
