/**
 * Every public endpoint of the app, found on disk so that a new one cannot be
 * left out of the abuse and cross-workspace tests: each app/api route.ts with
 * the methods it exports, and each server-action module ("use server") with
 * the functions it exports.
 */
import { readdirSync, readFileSync } from "node:fs";
import path from "node:path";

const root = path.resolve(__dirname, "../../..");
const METHODS = ["GET", "HEAD", "POST", "PUT", "PATCH", "DELETE"] as const;

export type RouteHandler = (request: Request, context: { params: Promise<Record<string, string>> }) => Promise<Response>;
export type RouteEndpoint = {
  /** e.g. "POST /api/recipes/:recipeId/versions/:versionRef" */
  name: string;
  method: (typeof METHODS)[number];
  /** URL path with `:param` placeholders. */
  pattern: string;
  params: string[];
  handler: RouteHandler;
};

export type ActionEndpoint = {
  /** e.g. "saveRecipeVersionAction (app/(app)/recipes/[recipeId]/actions.ts)" */
  name: string;
  exportName: string;
  file: string;
  /** 0: takes nothing; 1: defineAction (object or FormData); 2: (previousState, FormData). */
  arity: number;
  fn: (...args: unknown[]) => Promise<unknown>;
};

function walk(dir: string): string[] {
  return readdirSync(dir, { withFileTypes: true }).flatMap((e) => {
    const full = path.join(dir, e.name);
    return e.isDirectory() ? walk(full) : [full];
  });
}

export async function listRouteEndpoints(): Promise<RouteEndpoint[]> {
  const files = walk(path.join(root, "app/api")).filter((f) => f.endsWith(`${path.sep}route.ts`)).sort();
  const out: RouteEndpoint[] = [];
  for (const file of files) {
    const segments = path.relative(path.join(root, "app"), path.dirname(file)).split(path.sep);
    const params = segments.filter((s) => s.startsWith("[")).map((s) => s.slice(1, -1));
    const pattern = "/" + segments.map((s) => (s.startsWith("[") ? `:${s.slice(1, -1)}` : s)).join("/");
    const mod = (await import(file)) as Record<string, unknown>;
    for (const method of METHODS) {
      const handler = mod[method];
      if (typeof handler === "function") out.push({ name: `${method} ${pattern}`, method, pattern, params, handler: handler as RouteHandler });
    }
  }
  return out;
}

export async function listActionEndpoints(): Promise<ActionEndpoint[]> {
  const files = ["app", "lib", "components"]
    .flatMap((d) => walk(path.join(root, d)))
    .filter((f) => /\.tsx?$/.test(f) && /^\s*["']use server["']/.test(readFileSync(f, "utf8")))
    .sort();
  const out: ActionEndpoint[] = [];
  for (const file of files) {
    const mod = (await import(file)) as Record<string, unknown>;
    for (const [exportName, fn] of Object.entries(mod)) {
      if (typeof fn !== "function") continue;
      const rel = path.relative(root, file);
      out.push({ name: `${exportName} (${rel})`, exportName, file: rel, arity: fn.length, fn: fn as ActionEndpoint["fn"] });
    }
  }
  return out;
}

/** The path of a route with its params filled in. */
export function fillPattern(pattern: string, values: Record<string, string>): string {
  return pattern.replace(/:(\w+)/g, (_, p: string) => {
    try {
      return encodeURIComponent(values[p] ?? "x");
    } catch {
      return "%EF%BF%BD"; // a lone surrogate has no URL form; the handler still gets the raw value
    }
  });
}
