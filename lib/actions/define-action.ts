import "server-only";
import { unstable_rethrow } from "next/navigation";
import type { z } from "zod";
import { authorize } from "@/lib/auth/authorize";
import type { Viewer } from "@/lib/auth/current";
import type { Permission } from "@/lib/auth/permissions";
import { AppError, isDatabaseUnavailable, type ErrorCode } from "@/lib/errors";
import { unsafeInputProblem } from "@/lib/validation/safe-input";
import { formToObject } from "./result";

export type ActionResult<T = void> =
  | { ok: true; data: T; message?: string }
  | { ok: false; code: ErrorCode | "error"; message: string; fieldErrors?: Record<string, string[] | undefined> };

type Handler<S extends z.ZodType, T> = (input: z.infer<S>, viewer: Viewer) => Promise<T>;

/**
 * The one shape of a signed-in mutation: validate → authorise → run → result.
 * `permission` is required, so no action can forget its check. Accepts a plain
 * object or a FormData (the framework's `$ACTION…` fields are dropped first).
 */
export function defineAction<S extends z.ZodType, T>(opts: {
  schema: S;
  permission: Permission;
  handler: Handler<S, T>;
}): (input: unknown) => Promise<ActionResult<T>> {
  return async (input) => {
    const raw = input instanceof FormData ? formToObject(input) : input;
    try {
      // Authorise before parsing so a signed-out caller learns nothing about the schema.
      const viewer = await authorize(opts.permission);
      const problem = unsafeInputProblem(raw);
      if (problem) return { ok: false, code: "invalid", message: problem, fieldErrors: { _form: [problem] } };
      const parsed = opts.schema.safeParse(raw);
      if (!parsed.success) {
        return {
          ok: false,
          code: "invalid",
          message: "Check the highlighted fields.",
          fieldErrors: fieldErrorsOf(parsed.error),
        };
      }
      return { ok: true, data: await opts.handler(parsed.data, viewer) };
    } catch (err) {
      return toFailure(err);
    }
  };
}

/**
 * For the few actions a signed-out visitor may call (sign-in, sign-up, password
 * reset, accepting an invitation): validate → run → result, no permission.
 */
export function definePublicAction<S extends z.ZodType, T>(opts: {
  schema: S;
  handler: (input: z.infer<S>) => Promise<T>;
}): (prev: unknown, formData: FormData) => Promise<ActionResult<T>> {
  return async (_prev, formData) => {
    try {
      const raw = formData instanceof FormData ? formToObject(formData) : formData;
      const problem = unsafeInputProblem(raw);
      if (problem) return { ok: false, code: "invalid", message: problem, fieldErrors: { _form: [problem] } };
      const parsed = opts.schema.safeParse(raw);
      if (!parsed.success) {
        return { ok: false, code: "invalid", message: "Check the highlighted fields.", fieldErrors: fieldErrorsOf(parsed.error) };
      }
      return { ok: true, data: await opts.handler(parsed.data) };
    } catch (err) {
      return toFailure(err);
    }
  };
}

/** The same as defineAction, shaped for `useActionState(action, null)` forms. */
export function defineFormAction<S extends z.ZodType, T>(opts: {
  schema: S;
  permission: Permission;
  handler: Handler<S, T>;
}): (prev: unknown, formData: FormData) => Promise<ActionResult<T>> {
  const run = defineAction(opts);
  return (_prev, formData) => run(formData);
}

export function fieldErrorsOf(error: z.ZodError): Record<string, string[]> {
  const out: Record<string, string[]> = {};
  for (const issue of error.issues) {
    const key = issue.path.length ? issue.path.join(".") : "_form";
    (out[key] ??= []).push(issue.message);
  }
  return out;
}

/** Maps any thrown value to a failure result; rethrows Next.js redirects. */
export function toFailure(err: unknown): { ok: false; code: ErrorCode | "error"; message: string; fieldErrors?: Record<string, string[] | undefined> } {
  unstable_rethrow(err); // redirects and not-found are control flow, not failures
  if (err instanceof AppError) return { ok: false, code: err.code, message: err.message, fieldErrors: err.fieldErrors };
  if (isDatabaseUnavailable(err)) {
    return { ok: false, code: "unavailable", message: "The database is not answering. Nothing was saved; try again shortly." };
  }
  console.error("action failed:", err);
  return { ok: false, code: "error", message: "Something went wrong on our side. Nothing was saved." };
}
