/** What every server action returns: never a raw database error. */
export type ActionResult<T = undefined> =
  | ({ ok: true } & (T extends undefined ? { data?: undefined } : { data: T }))
  | { ok: false; message: string; fieldErrors?: Record<string, string[] | undefined> };

export type FormState = { ok: boolean; message?: string; fieldErrors?: Record<string, string[] | undefined> } | null;

/**
 * A FormData as a plain object, without the framework's own `$ACTION…` fields,
 * so zod schemas can be `.strict()` and still accept a real form post.
 */
export function formToObject(formData: FormData): Record<string, FormDataEntryValue> {
  const out: Record<string, FormDataEntryValue> = {};
  for (const [key, value] of formData.entries()) {
    if (key.startsWith("$ACTION")) continue;
    out[key] = value;
  }
  return out;
}
