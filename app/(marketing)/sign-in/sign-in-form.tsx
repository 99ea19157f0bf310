"use client";

import Link from "next/link";
import { useActionState } from "react";
import { FormAlert, fieldError } from "@/components/forms/form-alert";
import { Button } from "@/components/ui/button";
import { Field } from "@/components/ui/field";
import { Input } from "@/components/ui/input";
import { signInAction } from "./actions";

export function SignInForm() {
  const [result, action, pending] = useActionState(signInAction, null);
  const emailError = fieldError(result, "email");
  const passwordError = fieldError(result, "password");
  return (
    <form action={action} className="flex flex-col gap-5" noValidate>
      <FormAlert result={result} />
      <Field id="email" label="E-mail" error={emailError}>
        <Input id="email" name="email" type="email" autoComplete="email" required aria-invalid={!!emailError} />
      </Field>
      <Field id="password" label="Password" error={passwordError}>
        <Input id="password" name="password" type="password" autoComplete="current-password" required aria-invalid={!!passwordError} />
      </Field>
      <Button type="submit" disabled={pending}>
        {pending ? "Signing in…" : "Sign in"}
      </Button>
      <p className="flex justify-between text-sm">
        <Link href="/forgot-password" className="text-pod-dark underline">
          Forgot your password?
        </Link>
        <Link href="/sign-up" className="text-pod-dark underline">
          Create a workspace
        </Link>
      </p>
    </form>
  );
}
