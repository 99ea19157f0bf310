/**
 * A check every mutation's raw input passes before its zod schema: things no
 * field of Barwright ever needs and the database cannot hold as they are.
 * PostgreSQL text refuses the NUL character (a raw error, a 500, before this
 * check), a lone UTF-16 surrogate would be silently replaced by U+FFFD on the
 * way to the database (stored text differing from what was sent), and a
 * deeply nested body is only ever an attack on the parser's stack.
 * Visible bidi and zero-width characters are legitimate in names and are kept.
 */

/** Deeper than any input Barwright accepts (recipe lines inside a request are 3 levels down). */
export const MAX_INPUT_DEPTH = 16;

const NUL = "\u0000";
// A high surrogate not followed by a low one, or a low one not preceded by a high one.
const LONE_SURROGATE = /[\uD800-\uDBFF](?![\uDC00-\uDFFF])|(?<![\uD800-\uDBFF])[\uDC00-\uDFFF]/;

/** A sentence a person can act on, or null when the input may go on to its schema. */
export function unsafeInputProblem(raw: unknown): string | null {
  // Iterative walk: a hostile body nested 100,000 levels must not overflow the stack here.
  const stack: { value: unknown; depth: number }[] = [{ value: raw, depth: 0 }];
  while (stack.length > 0) {
    const { value, depth } = stack.pop()!;
    if (typeof value === "string") {
      if (value.includes(NUL)) return "Text cannot contain the NUL character.";
      if (LONE_SURROGATE.test(value)) return "Text contains a broken character (an unpaired surrogate); retype it.";
      continue;
    }
    if (value === null || typeof value !== "object" || value instanceof Blob) continue;
    if (depth >= MAX_INPUT_DEPTH) return "The request is nested too deeply.";
    const children = Array.isArray(value) ? value : Object.entries(value).flat();
    for (const child of children) stack.push({ value: child, depth: depth + 1 });
  }
  return null;
}
