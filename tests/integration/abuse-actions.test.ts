/**
 * Hostile input to every server action (every export of every "use server"
 * module, found on disk): non-objects, random JSON, the action's own fields
 * with hostile values (as an object and as a form post), NUL and lone
 * surrogates, nesting 100,000 deep, 10 MB strings. Each answer is a result:
 * a success or a named failure with a message — never "error" (our 500), never
 * a throw. Then what hostile text is stored comes back byte for byte.
 */
import fc from "fast-check";
import { beforeAll, describe, expect, it } from "vitest";
import { GET as getSuppliers } from "@/app/api/suppliers/route";
import { createSupplierAction } from "@/app/(app)/suppliers/actions";
import { callAction, expectActionHandled } from "../support/abuse/call";
import { listActionEndpoints, type ActionEndpoint } from "../support/abuse/endpoints";
import { HTML_INJECTION, SQL_INJECTION, hostileForm, hostileJson, shapedObject } from "../support/abuse/hostile";
import { makeWorkspaceResources, type WorkspaceResources } from "../support/abuse/resources";
import { createTeam, signInAs, type TeamFixture } from "../support/fixtures";
import { base, params } from "../support/matrix";
import { freshRequest } from "../support/request";

const actions = await listActionEndpoints();
const RUNS = 20;

let team: TeamFixture;
let resources: WorkspaceResources;

beforeAll(async () => {
  team = await createTeam("abuse-a");
  resources = await makeWorkspaceResources(team);
});

// A fresh session each time: an action may sign out, switch workspace or change the caller's own account.
async function asOwner() {
  freshRequest(`10.5.${Math.floor(Math.random() * 250)}.${Math.floor(Math.random() * 250)}`);
  await signInAs(team.people.owner.id, team.workspaceId);
}

/** Calls an action the two ways a client can: one value, or (previous state, form data). */
const invoke = (action: ActionEndpoint, input: unknown) => callAction(action, action.arity >= 2 ? [null, input] : [input]);

/** The fields an action's schema asks for, read from its answer to an empty input. */
async function fieldsOf(action: ActionEndpoint): Promise<string[]> {
  const result = await invoke(action, action.arity >= 2 ? new FormData() : {});
  if (result === "redirect" || result.ok) return [];
  const errors = (result as { fieldErrors?: Record<string, unknown> }).fieldErrors ?? {};
  return Object.keys(errors).filter((k) => k !== "_form").map((k) => k.split(".")[0]!);
}

/** Half the time a field named like one of the workspace's rows gets that row's id, so checks past the id run too. */
const withRealIds = (value: Record<string, unknown>) =>
  Object.fromEntries(Object.entries(value).map(([k, v]) => [k, k !== "userId" && resources.ids[k] && Math.random() < 0.5 ? resources.ids[k] : v]));

const takesInput = actions.filter((a) => a.arity > 0);

describe.each(takesInput)("$name", (action) => {
  it("answers hostile input with a result: success or a named failure", async () => {
    await asOwner();
    const keys = await fieldsOf(action);
    await fc.assert(
      fc.asyncProperty(fc.oneof(hostileJson, shapedObject(keys)), fc.boolean(), async (value, asForm) => {
        await asOwner();
        const shaped = value && typeof value === "object" && !Array.isArray(value) ? withRealIds(value as Record<string, unknown>) : value;
        const input = asForm && shaped && typeof shaped === "object" && !Array.isArray(shaped) ? hostileForm(shaped as Record<string, unknown>) : shaped;
        expectActionHandled(action, await invoke(action, input), JSON.stringify(shaped)?.slice(0, 300) ?? String(shaped));
      }),
      { numRuns: RUNS },
    );
  });

  it("refuses NUL, lone surrogates, deep nesting and 10 MB strings in every field", async () => {
    await asOwner();
    const keys = await fieldsOf(action);
    let deep: unknown = {};
    for (let i = 0; i < 100_000; i++) deep = [deep];
    const fields = (v: unknown) => Object.fromEntries((keys.length ? keys : ["name"]).map((k) => [k, v]));
    for (const [what, input] of [
      ["NUL", fields("nib\u0000s")],
      ["a lone surrogate", fields("\uD800")],
      ["100,000 levels of nesting", deep],
      ["a 10 MB string", fields("x".repeat(10 * 1024 * 1024))],
    ] as const) {
      await asOwner();
      const result = await invoke(action, input);
      expectActionHandled(action, result, what);
      if (result !== "redirect") expect(result.ok, `${action.name} accepted ${what}`).toBe(false);
    }
  });
});

describe("hostile text that is valid", () => {
  // Names a supplier may truly have, however odd: stored and given back unchanged, as data.
  const names = [...SQL_INJECTION, ...HTML_INJECTION, "\u202Eeulb kram", "co\u200Bcoa\u200D", "Ｃｏｃｏａ 🍫", "Cafe\u0301 Œuvre", "a\u0007b"];

  it("comes back byte for byte from the API", async () => {
    await asOwner();
    for (const name of names) {
      const result = await createSupplierAction({ name, currency: "EUR" });
      expect(result.ok, `${name}: ${JSON.stringify(result)}`).toBe(true);
    }
    const res = await getSuppliers(new Request(`${base}/api/suppliers`), params());
    const stored = ((await res.json()) as { suppliers: { name: string }[] }).suppliers.map((s) => s.name);
    for (const name of names) expect(stored).toContain(name);
  });
});

describe("the action list", () => {
  it("finds every server action on disk", () => {
    expect(actions.length).toBeGreaterThanOrEqual(50);
    expect(actions.filter((a) => a.arity === 0).map((a) => a.exportName).sort()).toEqual(["signOutAction", "signOutEverywhereAction"]);
  });
});
