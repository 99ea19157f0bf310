"use server";

import { redirect } from "next/navigation";
import { definePublicAction } from "@/lib/actions/define-action";
import { acceptInvitationWithToken } from "@/lib/auth/accounts";
import { acceptInvitationSchema } from "@/lib/validation/auth";

export const acceptInvitationAction = definePublicAction({
  schema: acceptInvitationSchema,
  handler: async (input) => {
    await acceptInvitationWithToken(input);
    redirect("/overview");
  },
});
