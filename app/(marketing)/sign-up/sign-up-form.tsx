"use client";

import { useActionState } from "react";
import { FormAlert, fieldError } from "@/components/forms/form-alert";
import { Button } from "@/components/ui/button";
import { Field } from "@/components/ui/field";
import { Input } from "@/components/ui/input";
import { MIN_PASSWORD_LENGTH } from "@/lib/auth/common-passwords";
import { signUpAction } from "./actions";

export function SignUpForm() {
  const [result, action, pending] = useActionState(signUpAction, null);
  const err = (f: string) => fieldError(result, f);
  return (
    <form action={action} className="flex flex-col gap-5" noValidate>
      <FormAlert result={result} />
      <Field id="name" label="Your name" error={err("name")}>
        <Input id="name" name="name" autoComplete="name" required aria-invalid={!!err("name")} />
      </Field>
      <Field id="workspaceName" label="Business name" hint="For example, your chocolate company's name." error={err("workspaceName")}>
        <Input id="workspaceName" name="workspaceName" autoComplete="organization" required aria-invalid={!!err("workspaceName")} />
      </Field>
      <Field id="email" label="E-mail" error={err("email")}>
        <Input id="email" name="email" type="email" autoComplete="email" required aria-invalid={!!err("email")} />
      </Field>
      <Field id="password" label="Password" hint={`At least ${MIN_PASSWORD_LENGTH} characters.`} error={err("password")}>
        <Input id="password" name="password" type="password" autoComplete="new-password" required aria-invalid={!!err("password")} />
      </Field>
      <Button type="submit" disabled={pending}>
        {pending ? "Creating…" : "Create workspace"}
      </Button>
    </form>
  );
}
