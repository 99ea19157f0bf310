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
