"use client";

import { useActionState } from "react";
import { changePasswordAction } from "@/app/(app)/settings/account/actions";
import { FormAlert, fieldError } from "@/components/forms/form-alert";
import { Button } from "@/components/ui/button";
import { Field } from "@/components/ui/field";
import { Input } from "@/components/ui/input";
import { MIN_PASSWORD_LENGTH } from "@/lib/auth/common-passwords";

export function ChangePasswordForm() {
  const [result, action, pending] = useActionState(changePasswordAction, null);
  const shown = result?.ok ? { ok: true, message: "Password changed. Other devices were signed out." } : result;
  return (
    <form action={action} className="flex flex-col gap-5" noValidate>
      <FormAlert result={shown} />
      <Field id="currentPassword" label="Current password" error={fieldError(result, "currentPassword")}>
        <Input id="currentPassword" name="currentPassword" type="password" autoComplete="current-password" required />
      </Field>
      <Field id="newPassword" label="New password" hint={`At least ${MIN_PASSWORD_LENGTH} characters.`} error={fieldError(result, "newPassword")}>
        <Input id="newPassword" name="newPassword" type="password" autoComplete="new-password" required />
      </Field>
      <div>
        <Button type="submit" disabled={pending}>
          {pending ? "Saving…" : "Change password"}
        </Button>
      </div>
    </form>
  );
}
