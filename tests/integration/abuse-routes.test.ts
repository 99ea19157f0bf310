/**
 * Hostile input to every route handler under app/api (found on disk): random
 * and known-bad JSON and query values, malformed and 10 MB bodies, nesting
 * 100,000 deep. Each answer is a success or a 4xx with a readable message —
 * never a 500, never a hang, never a stack trace.
 */
import fc from "fast-check";
import { beforeAll, describe, expect, it } from "vitest";
import { listRouteEndpoints, fillPattern, type RouteEndpoint } from "../support/abuse/endpoints";
import { callRoute, expectHandled } from "../support/abuse/call";
import { MALFORMED_BODIES, deeplyNested, hostileForm, hostileJson, hostileString, hugeBody, shapedObject } from "../support/abuse/hostile";
import { makeWorkspaceResources, routeParamValues, type WorkspaceResources } from "../support/abuse/resources";
import { createTeam, signInAs, type TeamFixture } from "../support/fixtures";
import { freshRequest } from "../support/request";

const routes = await listRouteEndpoints();
const RUNS = 20;

// Query keys the app's GET handlers read; random ones come on top.
const QUERY_KEYS = ["archived", "q", "type", "status", "sort", "dir", "page", "pageSize", "lotId", "supplierId", "ingredientId", "ingredientIds", "on", "version", "format", "paper", "recipeId", "amount", "unit", "stationId", "machineId"];
// Printing starts Chromium; with a real id and a valid query these would print, so they get unknown ids here (their own tests print through a stub).
const PRINTS = new Set(["GET /api/batches/:batchId/pdf", "GET /api/labels/:recipeId"]);

let team: TeamFixture;
let resources: WorkspaceResources;

beforeAll(async () => {
  team = await createTeam("abuse-r");
  resources = await makeWorkspaceResources(team);
});

async function asOwner() {
  freshRequest();
  await signInAs(team.people.owner.id, team.workspaceId);
}

/** The real params, or (half the time) hostile ones. */
const paramsFor = (route: RouteEndpoint) =>
  fc.boolean().chain((real) => {
    if (real && !PRINTS.has(route.name)) return fc.constant(routeParamValues(route.pattern, route.params, resources));
    return fc.record(Object.fromEntries(route.params.map((p) => [p, hostileString])) as Record<string, fc.Arbitrary<string>>);
  });

/** The keys a mutating route's schema asks for, read from its answer to an empty body. */
async function fieldsOf(route: RouteEndpoint, params: Record<string, string>): Promise<{ keys: string[]; form: boolean }> {
  const res = await callRoute(route, fillPattern(route.pattern, params), params, { body: "{}", contentType: "application/json" });
  const body = (await res.json().catch(() => ({}))) as { error?: { code?: string; fieldErrors?: Record<string, unknown> } };
  const form = res.status === 400 && body.error?.code === "malformed";
  return { keys: Object.keys(body.error?.fieldErrors ?? {}).filter((k) => k !== "_form").map((k) => k.split(".")[0]!), form };
}

describe.each(routes.filter((r) => r.method === "GET" || r.method === "HEAD"))("$name", (route) => {
  it("answers hostile query strings and params with a success or a clear 4xx", async () => {
    await asOwner();
    await fc.assert(
      fc.asyncProperty(paramsFor(route), fc.dictionary(fc.oneof(fc.constantFrom(...QUERY_KEYS), hostileString), hostileString, { maxKeys: 4 }), async (params, query) => {
        if (PRINTS.has(route.name)) delete query.paper; // see PRINTS
        const res = await callRoute(route, fillPattern(route.pattern, params), params, { query });
        await expectHandled(route, res, `params ${JSON.stringify(params)} and query ${JSON.stringify(query)}`);
      }),
      { numRuns: RUNS },
    );
  });
});

describe.each(routes.filter((r) => r.method !== "GET" && r.method !== "HEAD"))("$name", (route) => {
  it("answers hostile JSON and form bodies with a success or a clear 4xx", async () => {
    await asOwner();
    const { keys, form } = await fieldsOf(route, routeParamValues(route.pattern, route.params, resources));
    const body = fc.oneof(hostileJson, shapedObject(keys));
    await fc.assert(
      fc.asyncProperty(paramsFor(route), body, async (params, value) => {
        const path = fillPattern(route.pattern, params);
        const res = form && value && typeof value === "object" && !Array.isArray(value)
          ? await callRoute(route, path, params, { body: hostileForm(value as Record<string, unknown>) })
          : await callRoute(route, path, params, { body: JSON.stringify(value) ?? "", contentType: "application/json" });
        await expectHandled(route, res, `params ${JSON.stringify(params)} and body ${JSON.stringify(value)?.slice(0, 300)}`);
      }),
      { numRuns: RUNS },
    );
  });

  it("refuses malformed, deeply nested and 10 MB bodies with a 4xx", async () => {
    await asOwner();
    const params = routeParamValues(route.pattern, route.params, resources);
    const path = fillPattern(route.pattern, params);
    for (const raw of [...MALFORMED_BODIES, deeplyNested(100_000)]) {
      const res = await callRoute(route, path, params, { body: raw, contentType: "application/json" });
      await expectHandled(route, res, `body ${JSON.stringify(raw.slice(0, 40))}`);
      expect(res.status, `${route.name} accepted ${raw.slice(0, 40)}`).toBeGreaterThanOrEqual(400);
    }
    const started = Date.now();
    const huge = await callRoute(route, path, params, { body: hugeBody(10 * 1024 * 1024), contentType: "application/json" });
    await expectHandled(route, huge, "a 10 MB body");
    expect(huge.status).toBeGreaterThanOrEqual(400);
    expect(Date.now() - started, `${route.name} took long over a 10 MB body`).toBeLessThan(5_000);
  });
});

describe("the route list", () => {
  it("finds every route handler on disk", () => {
    // A floor, so a broken scan cannot pass by finding nothing.
    expect(routes.length).toBeGreaterThanOrEqual(30);
  });
});
