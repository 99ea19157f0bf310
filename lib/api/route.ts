import "server-only";
import { NextResponse } from "next/server";
import type { z } from "zod";
import { fieldErrorsOf } from "@/lib/actions/define-action";
import { formToObject } from "@/lib/actions/result";
import { authorize } from "@/lib/auth/authorize";
import type { Viewer } from "@/lib/auth/current";
import type { Permission } from "@/lib/auth/permissions";
import { AppError, httpStatus, isDatabaseUnavailable } from "@/lib/errors";
import { unsafeInputProblem } from "@/lib/validation/safe-input";

type RouteContext = { params: Promise<Record<string, string | string[] | undefined>> };

/** JSON error body: `{ error: { code, message, fieldErrors? } }`. */
export function jsonError(status: number, code: string, message: string, fieldErrors?: Record<string, string[] | undefined>) {
  return NextResponse.json({ error: { code, message, ...(fieldErrors ? { fieldErrors } : {}) } }, { status });
}

/**
 * A signed-in JSON route handler: same-origin check for methods that change
 * data (CSRF), session and permission (401/403), input parsed with zod from the
 * query (GET) or the JSON body (422 on bad input, 400 on malformed JSON), then
 * the handler. AppErrors map to their status; a lost database to 503.
 * `body: "form"` reads a multipart/form-data body instead (file uploads: File
 * values reach the schema as they are). A handler that returns a Response (a
 * file or CSV download) has it sent unchanged. `maxBodyBytes` refuses a larger
 * body (413) from its Content-Length before reading it, and stops reading
 * one whose bytes pass the limit; JSON bodies default to MAX_JSON_BODY_BYTES.
 */
export function apiRoute<S extends z.ZodType>(opts: {
  permission: Permission;
  schema: S;
  body?: "json" | "form";
  maxBodyBytes?: number;
  handler: (ctx: { input: z.infer<S>; viewer: Viewer; params: Record<string, string | string[] | undefined>; request: Request }) => Promise<unknown>;
}) {
  return async (request: Request, context: RouteContext): Promise<Response> => {
    const mutates = !["GET", "HEAD"].includes(request.method);
    if (mutates && !isSameOrigin(request)) {
      return jsonError(403, "cross_origin", "Requests that change data must come from Barwright itself.");
    }
    try {
      const viewer = await authorize(opts.permission);
      let raw: unknown;
      const limit = opts.maxBodyBytes ?? MAX_JSON_BODY_BYTES;
      const tooLarge = () => {
        const mb = Math.max(1, Math.round(limit / (1024 * 1024)));
        return jsonError(413, "too_large", `That ${opts.body === "form" ? "upload" : "request"} is larger than ${mb} MB. Nothing was saved.`);
      };
      const length = Number(request.headers.get("content-length") ?? 0);
      if (mutates && length > limit) return tooLarge();
      if (mutates) {
        // Content-Length can be absent (chunked) or wrong: count the bytes as they arrive.
        const bytes = await readAtMost(request, limit);
        if (!bytes) return tooLarge();
        if (opts.body === "form") {
          try {
            const copy = new Response(bytes, { headers: { "content-type": request.headers.get("content-type") ?? "" } });
            raw = formToObject(await copy.formData());
          } catch {
            return jsonError(400, "malformed", "The request body is not a valid form upload.");
          }
        } else {
          try {
            // A bodiless DELETE (or POST) means "no fields".
            const text = new TextDecoder("utf-8", { fatal: true }).decode(bytes);
            raw = text.trim() === "" ? {} : JSON.parse(text);
          } catch {
            return jsonError(400, "malformed", "The request body is not valid JSON.");
          }
        }
      } else {
        raw = Object.fromEntries(new URL(request.url).searchParams);
      }
      const problem = unsafeInputProblem(raw);
      if (problem) return jsonError(422, "invalid", problem, { _form: [problem] });
      const parsed = opts.schema.safeParse(raw);
      if (!parsed.success) return jsonError(422, "invalid", "The request has invalid fields.", fieldErrorsOf(parsed.error));
      const params = (await context.params) ?? {};
      const data = await opts.handler({ input: parsed.data, viewer, params, request });
      if (data instanceof Response) return data;
      return NextResponse.json(data, { headers: { "cache-control": "no-store" } });
    } catch (err) {
      if (err instanceof AppError) return jsonError(httpStatus[err.code], err.code, err.message, err.fieldErrors);
      if (isDatabaseUnavailable(err)) return jsonError(503, "unavailable", "The database is not answering; try again shortly.");
      console.error("route handler failed:", err);
      return jsonError(500, "error", "Something went wrong on our side.");
    }
  };
}

/** JSON bodies larger than this are refused (413) unless a route sets its own maxBodyBytes. */
export const MAX_JSON_BODY_BYTES = 1024 * 1024;

/** The body's bytes, or null as soon as it passes `limit` (the rest is never buffered). */
async function readAtMost(request: Request, limit: number): Promise<Uint8Array<ArrayBuffer> | null> {
  if (!request.body) return new Uint8Array(0);
  const reader = request.body.getReader();
  const chunks: Uint8Array[] = [];
  let total = 0;
  for (;;) {
    const { done, value } = await reader.read();
    if (done) break;
    total += value.byteLength;
    if (total > limit) {
      await reader.cancel().catch(() => undefined);
      return null;
    }
    chunks.push(value);
  }
  const out = new Uint8Array(total);
  let at = 0;
  for (const c of chunks) {
    out.set(c, at);
    at += c.byteLength;
  }
  return out;
}

/**
 * CSRF defence for route handlers (server actions get Next.js's own Origin
 * check): a browser's Sec-Fetch-Site must say same-origin, and an Origin header,
 * when present, must match the Host the request was sent to.
 */
export function isSameOrigin(request: Request): boolean {
  const site = request.headers.get("sec-fetch-site");
  if (site && site !== "same-origin" && site !== "none") return false;
  const origin = request.headers.get("origin");
  if (!origin) return true;
  const host = request.headers.get("x-forwarded-host") ?? request.headers.get("host");
  try {
    return new URL(origin).host === host;
  } catch {
    return false;
  }
}
