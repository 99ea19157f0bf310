/** The one-line outcome of a form submission, announced to screen readers. */
export function FormAlert({ result }: { result: { ok: boolean; message?: string } | null | undefined }) {
  if (!result?.message) return null;
  return (
    <p
      role={result.ok ? "status" : "alert"}
      data-testid={result.ok ? "form-success" : "form-error"}
      className={
        result.ok
          ? "rounded-lg bg-sage-light px-3 py-2 text-sm text-sage"
          : "rounded-lg bg-brick-light px-3 py-2 text-sm text-brick"
      }
    >
      {result.message}
    </p>
  );
}

/** The first error for a field, from an action result. */
export function fieldError(
  result: { ok: boolean; fieldErrors?: Record<string, string[] | undefined> } | null | undefined,
  field: string,
): string | undefined {
  if (!result || result.ok) return undefined;
  return result.fieldErrors?.[field]?.[0];
}
