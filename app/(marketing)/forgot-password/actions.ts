"use server";

import { definePublicAction } from "@/lib/actions/define-action";
import { requestPasswordReset } from "@/lib/auth/accounts";
import { requestResetSchema } from "@/lib/validation/auth";

export const requestResetAction = definePublicAction({
  schema: requestResetSchema,
  handler: async (input) => {
    await requestPasswordReset(input);
  },
});
