"use client";

import { useTransition } from "react";
import { revokeInvitationAction } from "@/app/(app)/settings/members/actions";
import { Button } from "@/components/ui/button";
import { useToast } from "@/components/ui/toast";

export function RevokeInvitationButton({ invitationId, email }: { invitationId: string; email: string }) {
  const toast = useToast();
  const [pending, start] = useTransition();
  return (
    <Button
      variant="quiet"
      size="sm"
      disabled={pending}
      aria-label={`Revoke the invitation of ${email}`}
      onClick={() =>
        start(async () => {
          const r = await revokeInvitationAction({ invitationId });
          toast(r.ok ? { title: `Invitation of ${email} revoked.`, tone: "success" } : { title: "Not revoked", description: r.message, tone: "error" });
        })
      }
    >
      Revoke
    </Button>
  );
}
