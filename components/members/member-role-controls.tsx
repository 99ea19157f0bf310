"use client";

import { useState, useTransition } from "react";
import { changeRoleAction, removeMemberAction } from "@/app/(app)/settings/members/actions";
import { Button } from "@/components/ui/button";
import { Dialog } from "@/components/ui/dialog";
import { Select } from "@/components/ui/select";
import { useToast } from "@/components/ui/toast";
import { roleOptions } from "./role-options";

/** An owner's controls on one member: change role, remove (with confirmation). */
export function MemberRoleControls({ userId, name, role }: { userId: string; name: string; role: string }) {
  const toast = useToast();
  const [pending, start] = useTransition();
  const [confirming, setConfirming] = useState(false);
  const report = (r: { ok: boolean; message?: string }, done: string) =>
    toast(r.ok ? { title: done, tone: "success" } : { title: "Not changed", description: r.message, tone: "error" });
  return (
    <div className="flex items-center gap-2">
      <div className="w-72">
        <Select
          value={role}
          ariaLabel={`Role of ${name}`}
          options={roleOptions}
          onValueChange={(next) => start(async () => report(await changeRoleAction({ userId, role: next }), `${name} is now ${next}.`))}
        />
      </div>
      <Dialog
        open={confirming}
        onOpenChange={setConfirming}
        title={`Remove ${name}?`}
        description="They lose access to this workspace at once and are signed out everywhere. Their past work stays."
        trigger={
          <Button variant="quiet" size="sm" disabled={pending} aria-label={`Remove ${name}`}>
            Remove
          </Button>
        }
      >
        <div className="flex justify-end gap-2">
          <Button variant="secondary" onClick={() => setConfirming(false)}>
            Keep
          </Button>
          <Button
            variant="danger"
            disabled={pending}
            onClick={() =>
              start(async () => {
                report(await removeMemberAction({ userId }), `${name} was removed.`);
                setConfirming(false);
              })
            }
          >
            Remove {name}
          </Button>
        </div>
      </Dialog>
    </div>
  );
}
