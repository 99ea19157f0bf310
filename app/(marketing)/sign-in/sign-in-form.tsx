"use client";

import { useActionState } from "react";
import { Button } from "@/components/ui/button";
import { Field } from "@/components/ui/field";
import { Input } from "@/components/ui/input";
import { signInAction } from "./actions";

export function SignInForm() {
  const [state, action, pending] = useActionState(signInAction, null);
  const errors = state?.fieldErrors ?? {};
  return (
    <form action={action} className="flex flex-col gap-5" noValidate>
      {state && !state.ok && state.message ? (
        <p role="alert" data-testid="form-error" className="rounded-lg bg-brick-light px-3 py-2 text-sm text-brick">
          {state.message}
        </p>
      ) : null}
      <Field id="email" label="E-mail" error={errors.email?.[0]}>
        <Input id="email" name="email" type="email" autoComplete="email" required aria-invalid={!!errors.email} />
      </Field>
      <Field id="password" label="Password" error={errors.password?.[0]}>
        <Input
          id="password"
          name="password"
          type="password"
          autoComplete="current-password"
          required
          aria-invalid={!!errors.password}
        />
      </Field>
      <Button type="submit" disabled={pending}>
        {pending ? "Signing in…" : "Sign in"}
      </Button>
    </form>
  );
}
