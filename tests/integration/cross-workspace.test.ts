/**
 * Cross-workspace access by id: the owner of workspace B (who holds every
 * right in B) aims each route handler at workspace A's rows and gets 404 —
 * not 403 (which would confirm the row exists), not 200. Routes are found on
 * disk, so a new one is covered; every server action, and every route handler
 * again with a valid body, must have a row in a role × action matrix, whose
 * "outsider" caller is exactly this check (tests/support/matrix.ts).
 */
import { readdirSync, readFileSync } from "node:fs";
import path from "node:path";
import { randomUUID } from "node:crypto";
import { beforeAll, describe, expect, it } from "vitest";
import { GET as download } from "@/app/api/files/[fileId]/route";
import { db } from "@/db/client";
import { recipeVersions } from "@/db/schema";
import { eq } from "drizzle-orm";
import { callRoute } from "../support/abuse/call";
import { fillPattern, listActionEndpoints, listRouteEndpoints, type RouteEndpoint } from "../support/abuse/endpoints";
import { makeWorkspaceResources, routeParamValues, type WorkspaceResources } from "../support/abuse/resources";
import { tinyPdf } from "../support/files";
import { createTeam, signInAs, type TeamFixture } from "../support/fixtures";
import { base, params } from "../support/matrix";
import { freshRequest } from "../support/request";

const routes = await listRouteEndpoints();
const actions = (await listActionEndpoints()).filter((a) => a.arity > 0);

let a: TeamFixture;
let b: TeamFixture;
let aRows: WorkspaceResources;

beforeAll(async () => {
  a = await createTeam("xws-a");
  b = await createTeam("xws-b");
  aRows = await makeWorkspaceResources(a);
});

async function asOwnerOf(team: TeamFixture) {
  freshRequest();
  await signInAs(team.people.owner.id, team.workspaceId);
}

/** A body that passes each id-addressed mutating route's schema, so the answer comes from the lookup, not from validation. */
function validBody(route: RouteEndpoint): { body?: BodyInit; contentType?: string } {
  if (["GET", "HEAD", "DELETE"].includes(route.method)) return {};
  if (route.name.endsWith("/files")) {
    const f = new FormData();
    f.set("file", new File([new Uint8Array(tinyPdf())], "spec.pdf", { type: "application/pdf" }));
    return { body: f };
  }
  if (route.name === "POST /api/recipes/:recipeId/versions") {
    const lines = [{ ingredientId: randomUUID(), percent: "70" }, { ingredientId: randomUUID(), percent: "30" }];
    return { body: JSON.stringify({ baseVersionNo: 1, barMassGrams: "70", lines }), contentType: "application/json" };
  }
  throw new Error(`cross-workspace: give ${route.name} a valid body in tests/integration/cross-workspace.test.ts`);
}

const byId = routes.filter((r) => r.params.length > 0);

describe.each(byId)("$name with another workspace's ids", (route) => {
  it("answers 404 with a message", async () => {
    await asOwnerOf(b);
    const p = routeParamValues(route.pattern, route.params, aRows);
    const res = await callRoute(route, fillPattern(route.pattern, p), p, validBody(route));
    const body = (await res.json()) as { error?: { message?: string } };
    expect(res.status, JSON.stringify(body)).toBe(404);
    expect(body.error?.message).toMatch(/not found/i);
  });
});

describe("workspace A after B's attempts", () => {
  it("still has its files and only its own recipe versions", async () => {
    await asOwnerOf(a);
    for (const fileId of Object.values(aRows.fileIds)) {
      const res = await download(new Request(`${base}/api/files/${fileId}`), params({ fileId }));
      expect(res.status).toBe(200);
      await res.arrayBuffer();
    }
    const versions = await db.select().from(recipeVersions).where(eq(recipeVersions.recipeId, aRows.ids.recipeId!));
    expect(versions.map((v) => v.versionNo)).toEqual([1]);
  });
});

// Query parameters that name one row: a list filtered by another workspace's row is refused, not answered empty.
const ID_QUERIES: Record<string, string> = { lotId: "lotId", supplierId: "supplierId", ingredientId: "ingredientId", recipeId: "recipeId", ingredientIds: "ingredientId" };

describe.each(routes.filter((r) => r.params.length === 0 && r.method === "GET"))("$name with another workspace's id in the query", (route) => {
  it("never shows that workspace's rows", async () => {
    await asOwnerOf(b);
    const aIds = Object.values(aRows.ids).filter((v) => v.length > 10);
    for (const [key, kind] of Object.entries(ID_QUERIES)) {
      const res = await callRoute(route, route.pattern, {}, { query: { [key]: aRows.ids[kind]! } });
      const text = await res.text();
      if (res.status === 422) continue; // the route does not take this parameter
      expect([200, 404], `${route.name}?${key}=: ${text.slice(0, 200)}`).toContain(res.status);
      // Echoing the id asked for is not a leak; any other of A's ids would be.
      const leaked = aIds.filter((id) => id !== aRows.ids[kind] && text.includes(id));
      expect(leaked, `${route.name}?${key}=`).toEqual([]);
    }
  });
});

/** Row names and their "outsider" outcome, read from every matrix file's source. */
function matrixRows(): Map<string, string> {
  const dir = path.resolve(__dirname);
  const rows = new Map<string, string>();
  for (const file of readdirSync(dir).filter((f) => /matrix.*\.test\.ts$/.test(f))) {
    const src = readFileSync(path.join(dir, file), "utf8");
    for (const m of src.matchAll(/name: "([^"]+)",[\s\S]*?outsider: "(\w+)"/g)) rows.set(normalise(m[1]!), m[2]!);
  }
  return rows;
}

/** "GET /api/recipes/:id/versions/:n (a released version)" → "GET /api/recipes/:/versions/:" */
const normalise = (name: string) => name.replace(/ \(.*\)$/, "").replace(/\?.*$/, "").replace(/:\w+/g, ":").trim();

const byIdActions: string[] = [];

describe("the role × action matrices", () => {
  const rows = matrixRows();
  const PUBLIC = new Set(["GET /api/health", "GET /api/ping"]); // no session, no workspace rows

  it.each(routes.filter((r) => !PUBLIC.has(r.name)).map((r) => r.name))("have a row for %s", (name) => {
    expect(rows.has(normalise(name)), `no matrix row names ${name}`).toBe(true);
  });

  // Signed-out actions (sign-in, sign-up, password reset, accepting an invitation) touch no workspace's rows by id.
  const signedIn = actions.filter((x) => !x.file.startsWith(`app${path.sep}(marketing)`));

  it.each(signedIn.map((x) => x.exportName))("have a row for %s, and one naming another workspace's row expects 404", async (name) => {
    expect(rows.has(name), `no matrix row names ${name}`).toBe(true);
    // The fields the action asks for, from its answer to an empty input: one naming a row (…Id) means "by id".
    await asOwnerOf(b);
    const action = signedIn.find((x) => x.exportName === name)!;
    const result = (await (action.arity >= 2 ? action.fn(null, new FormData()) : action.fn({}))) as { fieldErrors?: Record<string, unknown> };
    const byIdFields = Object.keys(result.fieldErrors ?? {}).filter((k) => /Id$/.test(k));
    if (byIdFields.length > 0) {
      byIdActions.push(name);
      expect(rows.get(name), `${name} takes ${byIdFields.join(", ")}`).toBe("not_found");
    }
  });

  it("found the actions that take an id (so the check above is not empty)", () => {
    expect(byIdActions.length).toBeGreaterThanOrEqual(25);
  });
});
