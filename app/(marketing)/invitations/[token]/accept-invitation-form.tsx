"use client";

import { useActionState } from "react";
import { FormAlert, fieldError } from "@/components/forms/form-alert";
import { Button } from "@/components/ui/button";
import { Field } from "@/components/ui/field";
import { Input } from "@/components/ui/input";
import { MIN_PASSWORD_LENGTH } from "@/lib/auth/common-passwords";
import { acceptInvitationAction } from "./actions";

export function AcceptInvitationForm({ token, hasAccount }: { token: string; hasAccount: boolean }) {
  const [result, action, pending] = useActionState(acceptInvitationAction, null);
  return (
    <form action={action} className="flex flex-col gap-5" noValidate>
      <FormAlert result={result} />
      <input type="hidden" name="token" value={token} />
      {hasAccount ? (
        <Field id="password" label="Your Barwright password" error={fieldError(result, "password")}>
          <Input id="password" name="password" type="password" autoComplete="current-password" required />
        </Field>
      ) : (
        <>
          <Field id="name" label="Your name" error={fieldError(result, "name")}>
            <Input id="name" name="name" autoComplete="name" required />
          </Field>
          <Field id="password" label="Choose a password" hint={`At least ${MIN_PASSWORD_LENGTH} characters.`} error={fieldError(result, "password")}>
            <Input id="password" name="password" type="password" autoComplete="new-password" required />
          </Field>
        </>
      )}
      <Button type="submit" disabled={pending}>
        {pending ? "Joining…" : hasAccount ? "Sign in and join" : "Create account and join"}
      </Button>
    </form>
  );
}
