"use client";

import { useActionState } from "react";
import { inviteMemberAction } from "@/app/(app)/settings/members/actions";
import { FormAlert, fieldError } from "@/components/forms/form-alert";
import { Button } from "@/components/ui/button";
import { Field } from "@/components/ui/field";
import { Input } from "@/components/ui/input";
import { Select } from "@/components/ui/select";
import { roleOptions } from "./role-options";

export function InviteForm() {
  const [result, action, pending] = useActionState(inviteMemberAction, null);
  const shown = result?.ok ? { ok: true, message: `Invitation sent to ${result.data.email}.` } : result;
  return (
    <form action={action} className="grid gap-4 md:grid-cols-[1fr_18rem_auto] md:items-end" noValidate>
      <div className="md:col-span-3">
        <FormAlert result={shown} />
      </div>
      <Field id="invite-email" label="E-mail" error={fieldError(result, "email")}>
        <Input id="invite-email" name="email" type="email" required />
      </Field>
      <Field id="invite-role" label="Role" error={fieldError(result, "role")}>
        <Select id="invite-role" name="role" defaultValue="viewer" options={roleOptions} ariaLabel="Role" />
      </Field>
      <Button type="submit" disabled={pending}>
        {pending ? "Sending…" : "Send invitation"}
      </Button>
    </form>
  );
}
