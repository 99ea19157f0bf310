"use server";

import { definePublicAction } from "@/lib/actions/define-action";
import { resetPassword } from "@/lib/auth/accounts";
import { resetPasswordSchema } from "@/lib/validation/auth";

export const resetPasswordAction = definePublicAction({
  schema: resetPasswordSchema,
  handler: async (input) => {
    await resetPassword(input);
  },
});
