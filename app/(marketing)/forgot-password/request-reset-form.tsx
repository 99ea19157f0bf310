"use client";

import { useActionState } from "react";
import { FormAlert, fieldError } from "@/components/forms/form-alert";
import { Button } from "@/components/ui/button";
import { Field } from "@/components/ui/field";
import { Input } from "@/components/ui/input";
import { requestResetAction } from "./actions";

export function RequestResetForm() {
  const [result, action, pending] = useActionState(requestResetAction, null);
  const shown = result?.ok
    ? { ok: true, message: "If that address has an account, a reset link is on its way. Check your inbox." }
    : result;
  return (
    <form action={action} className="flex flex-col gap-5" noValidate>
      <FormAlert result={shown} />
      <Field id="email" label="E-mail" error={fieldError(result, "email")}>
        <Input id="email" name="email" type="email" autoComplete="email" required />
      </Field>
      <Button type="submit" disabled={pending}>
        {pending ? "Sending…" : "Send reset link"}
      </Button>
    </form>
  );
}
