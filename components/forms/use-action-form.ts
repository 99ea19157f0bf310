"use client";

import { useState, useTransition, type FormEvent } from "react";
import type { ActionResult } from "@/lib/actions/define-action";
import { fieldError } from "./form-alert";

/**
 * Submits a form to a server action without React's automatic form reset, so a
 * refused submission keeps everything the person typed beside the messages.
 * `onSuccess` may return a sentence to show as the success message.
 */
export function useActionForm<T>(
  action: (input: FormData) => Promise<ActionResult<T>>,
  onSuccess?: (data: T, form: HTMLFormElement) => string | void,
) {
  const [result, setResult] = useState<ActionResult<T> | null>(null);
  const [pending, start] = useTransition();
  const onSubmit = (event: FormEvent<HTMLFormElement>) => {
    event.preventDefault();
    const form = event.currentTarget;
    const data = new FormData(form);
    start(async () => {
      const r = await action(data);
      const message = r.ok ? onSuccess?.(r.data, form) : undefined;
      setResult(message && r.ok ? { ...r, message } : r);
    });
  };
  return { result, setResult, pending, onSubmit, error: (field: string) => fieldError(result, field) };
}
