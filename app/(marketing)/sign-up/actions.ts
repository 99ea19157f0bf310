"use server";

import { redirect } from "next/navigation";
import { definePublicAction } from "@/lib/actions/define-action";
import { signUp } from "@/lib/auth/accounts";
import { signUpSchema } from "@/lib/validation/auth";

export const signUpAction = definePublicAction({
  schema: signUpSchema,
  handler: async (input) => {
    await signUp(input);
    redirect("/overview");
  },
});
