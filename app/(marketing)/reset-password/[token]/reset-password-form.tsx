"use client";

import Link from "next/link";
import { useActionState } from "react";
import { FormAlert, fieldError } from "@/components/forms/form-alert";
import { Button } from "@/components/ui/button";
import { Field } from "@/components/ui/field";
import { Input } from "@/components/ui/input";
import { MIN_PASSWORD_LENGTH } from "@/lib/auth/common-passwords";
import { resetPasswordAction } from "./actions";

export function ResetPasswordForm({ token }: { token: string }) {
  const [result, action, pending] = useActionState(resetPasswordAction, null);
  if (result?.ok) {
    return (
      <div className="flex flex-col gap-4">
        <FormAlert result={{ ok: true, message: "Your password is changed." }} />
        <Link href="/sign-in" className="font-semibold text-pod-dark underline">
          Sign in with your new password
        </Link>
      </div>
    );
  }
  const tokenError = fieldError(result, "token");
  return (
    <form action={action} className="flex flex-col gap-5" noValidate>
      <FormAlert result={tokenError ? { ok: false, message: tokenError } : result} />
      <input type="hidden" name="token" value={token} />
      <Field id="password" label="New password" hint={`At least ${MIN_PASSWORD_LENGTH} characters.`} error={fieldError(result, "password")}>
        <Input id="password" name="password" type="password" autoComplete="new-password" required />
      </Field>
      <Button type="submit" disabled={pending}>
        {pending ? "Saving…" : "Set new password"}
      </Button>
    </form>
  );
}
