"use server";

import { defineFormAction } from "@/lib/actions/define-action";
import { changePassword } from "@/lib/auth/accounts";
import { changePasswordSchema } from "@/lib/validation/auth";

/** Changes the password; every other session of the user ends, this browser stays signed in. */
export const changePasswordAction = defineFormAction({
  schema: changePasswordSchema,
  permission: "account.manage",
  handler: async (input, viewer) => {
    await changePassword({
      userId: viewer.user.id,
      workspaceId: viewer.workspace.id,
      currentPassword: input.currentPassword,
      newPassword: input.newPassword,
    });
  },
});
