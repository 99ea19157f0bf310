/**
 * fast-check arbitraries for hostile input: the values an attacker or a broken
 * client sends instead of what a form would. Leaves are drawn from known
 * trouble (injection strings, unicode tricks, numbers JSON and decimal.js
 * choke on) mixed with random ones; shapes from the endpoint's own field names
 * (so values reach the field checks, not only the "unknown key" check).
 */
import fc from "fast-check";

export const SQL_INJECTION = ["'; drop table recipes; --", "1' or '1'='1", "\\'; select pg_sleep(5); --", "$1", "%' and 1=1 --"];
export const HTML_INJECTION = ["<script>alert(1)</script>", "\"><img src=x onerror=alert(1)>", "javascript:alert(1)", "{{7*7}}", "=HYPERLINK(\"x\")"];
export const UNICODE_TRICKS = [
  "\u202Egnp.exe", // right-to-left override
  "co\u200Bcoa", // zero-width space
  "\uFEFFsugar", // byte-order mark
  "\uD800", // lone high surrogate
  "\uDFFFx", // lone low surrogate
  "nib\u0000s", // NUL
  "\u0007\u001b[31m", // control characters, terminal escape
  "Ｃｏｃｏａ", // full-width
  "🍫".repeat(300),
  "e\u0301".repeat(200), // combining marks
];
export const NUMBER_STRINGS = ["NaN", "Infinity", "-Infinity", "1e309", "-0", "0x1F", "1_000", "9".repeat(400), "1e-400", "  12  ", "12,5", "½"];
export const NUMBERS = [Number.MAX_SAFE_INTEGER + 2, -Number.MAX_VALUE, Number.MIN_VALUE, 1e308, -1, 0, -0, 2 ** 31, 0.1 + 0.2];

export const hostileString = fc.oneof(
  fc.constantFrom(...SQL_INJECTION, ...HTML_INJECTION, ...UNICODE_TRICKS, ...NUMBER_STRINGS, "", " ", "null", "undefined", "true", "00000000-0000-0000-0000-000000000000"),
  fc.string({ maxLength: 40 }),
  fc.string({ unit: "grapheme", maxLength: 20 }),
  fc.string({ unit: "binary", maxLength: 20 }),
  fc.constant("x".repeat(100_000)),
);

export const hostileLeaf: fc.Arbitrary<unknown> = fc.oneof(
  hostileString,
  fc.constantFrom(...NUMBERS),
  fc.integer(),
  fc.double({ noNaN: true, noDefaultInfinity: true }),
  fc.boolean(),
  fc.constant(null),
);

/** Any JSON value with hostile leaves, a few levels deep. */
export const hostileJson: fc.Arbitrary<unknown> = fc.letrec<{ v: unknown }>((tie) => ({
  v: fc.oneof(
    { depthSize: "small", withCrossShrink: true },
    hostileLeaf,
    fc.array(tie("v"), { maxLength: 4 }),
    fc.dictionary(fc.oneof(hostileString, fc.constantFrom("__proto__", "constructor", "prototype")), tie("v"), { maxKeys: 4 }),
  ),
})).v;

/** An object with the endpoint's own keys (some missing, some extra) and hostile values. */
export function shapedObject(keys: string[]): fc.Arbitrary<Record<string, unknown>> {
  if (keys.length === 0) return fc.dictionary(hostileString, hostileJson, { maxKeys: 3 });
  return fc.record(Object.fromEntries(keys.map((k) => [k, hostileJson])), { requiredKeys: [] }) as fc.Arbitrary<Record<string, unknown>>;
}

/** A body nested `depth` levels deep, built without recursion. */
export function deeplyNested(depth: number): string {
  return "[".repeat(depth) + "]".repeat(depth);
}

/** A JSON body of about `bytes` bytes. */
export function hugeBody(bytes: number): string {
  return JSON.stringify({ name: "x".repeat(bytes), notes: "y" });
}

/** Raw bodies that are not JSON at all. */
export const MALFORMED_BODIES = ["{", "{\"a\":}", "undefined", "\u0000", "[1,2,", "{\"a\":1}{\"b\":2}", "\uFEFF{}", "NaN"];

/** Hostile inputs as a FormData: every value a string (what a browser form can send). */
export function hostileForm(values: Record<string, unknown>): FormData {
  const f = new FormData();
  for (const [k, v] of Object.entries(values)) f.set(k, typeof v === "string" ? v : JSON.stringify(v) ?? "");
  return f;
}
