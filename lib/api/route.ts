import "server-only";
import { NextResponse } from "next/server";
import type { z } from "zod";
import { fieldErrorsOf } from "@/lib/actions/define-action";
import { formToObject } from "@/lib/actions/result";
import { authorize } from "@/lib/auth/authorize";
import type { Viewer } from "@/lib/auth/current";
import type { Permission } from "@/lib/auth/permissions";
import { AppError, httpStatus, isDatabaseUnavailable } from "@/lib/errors";

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
 * body (413) from its Content-Length before reading it.
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
      const length = Number(request.headers.get("content-length") ?? 0);
      if (mutates && opts.maxBodyBytes && length > opts.maxBodyBytes) {
        const mb = (opts.maxBodyBytes / (1024 * 1024)).toFixed(0);
        return jsonError(413, "too_large", `That upload is larger than ${mb} MB. Nothing was saved.`);
      }
      if (mutates && opts.body === "form") {
        try {
          raw = formToObject(await request.formData());
        } catch {
          return jsonError(400, "malformed", "The request body is not a valid form upload.");
        }
      } else if (mutates) {
        try {
          // A bodiless DELETE (or POST) means "no fields".
          const text = await request.text();
          raw = text.trim() === "" ? {} : JSON.parse(text);
        } catch {
          return jsonError(400, "malformed", "The request body is not valid JSON.");
        }
      } else {
        raw = Object.fromEntries(new URL(request.url).searchParams);
      }
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
