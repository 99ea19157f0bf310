import Decimal from "decimal.js";
import { z } from "zod";

const DECIMAL = /^\d+(\.\d+)?$/;

/**
 * A non-negative decimal typed by a person ("12.5"), checked and returned as a
 * canonical decimal string ("12.50" → "12.5"). Never a JS number: money and
 * percentages stay exact (decimal.js).
 */
export function decimalText(opts: { label: string; max: string; decimals: number; positive?: boolean }) {
  return z
    .union([z.string(), z.number()])
    .transform((v) => String(v).trim())
    .superRefine((text, ctx) => {
      const fail = (message: string) => ctx.addIssue({ code: "custom", message });
      if (text === "") return fail(`Enter ${opts.label}.`);
      if (!DECIMAL.test(text)) return fail(`Enter ${opts.label} as a number, like 12.5 (a dot for decimals, no units).`);
      const value = new Decimal(text);
      if (opts.positive && value.lte(0)) return fail(`${capital(opts.label)} must be more than 0.`);
      if (value.gt(opts.max)) return fail(`${capital(opts.label)} must be at most ${opts.max}.`);
      if (value.decimalPlaces() > opts.decimals) return fail(`Use at most ${opts.decimals} decimal places for ${opts.label}.`);
    })
    .transform((text) => new Decimal(text).toFixed());
}

/**
 * The value as a Decimal, or null when it is not a plain decimal. For refine
 * callbacks: zod 4 runs a refinement even after the field's own check failed
 * (checks continue by default), so the callback can receive "NaN", an array or
 * a 10 MB string, and `new Decimal(…)` would throw (a 500) instead of letting
 * the field's own message through.
 */
export function decimalOrNull(v: unknown): Decimal | null {
  if (typeof v === "number" && Number.isFinite(v)) return new Decimal(v);
  return typeof v === "string" && v.length <= 40 && /^-?\d+(\.\d+)?$/.test(v.trim()) ? new Decimal(v.trim()) : null;
}

/** The same, but an empty field means "not given" (null). */
export function optionalDecimalText(opts: Parameters<typeof decimalText>[0]) {
  return z.preprocess(
    (v) => (v === undefined || v === null || (typeof v === "string" && v.trim() === "") ? null : v),
    decimalText(opts).nullable(),
  );
}

/** An optional free text, trimmed; empty → null. */
export function optionalText(max: number, label: string) {
  return z.preprocess(
    (v) => (typeof v === "string" && v.trim() === "" ? null : typeof v === "string" ? v.trim() : v),
    z.string().max(max, `Keep ${label} to ${max} characters.`).nullable().optional().transform((v) => v ?? null),
  );
}

/** An ISO calendar day, YYYY-MM-DD, that exists. */
export const isoDaySchema = z
  .string()
  .trim()
  .refine((v) => isRealIsoDay(v), "Enter a date as YYYY-MM-DD, like 2026-03-01.");

export function isRealIsoDay(v: string): boolean {
  if (!/^\d{4}-\d{2}-\d{2}$/.test(v)) return false;
  const d = new Date(`${v}T00:00:00Z`);
  return !Number.isNaN(d.getTime()) && d.toISOString().slice(0, 10) === v;
}

/** ISO 4217 alphabetic code, upper-cased. */
export const currencySchema = z
  .string()
  .trim()
  .toUpperCase()
  .regex(/^[A-Z]{3}$/, "Enter a three-letter currency code, like EUR, GBP or USD.");

/** A checkbox from a form ("on") or a JSON boolean. */
export const checkboxSchema = z.preprocess((v) => v === true || v === "on" || v === "true", z.boolean());

function capital(s: string): string {
  return s.charAt(0).toUpperCase() + s.slice(1);
}
