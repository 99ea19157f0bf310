/**
 * The role × action matrix harness. A feature's matrix file lists one row per
 * server action or route handler, with the permission it needs; `runMatrix`
 * calls each row as the five roles, a signed-out visitor and the owner of
 * another workspace, and checks the outcome against `expectedRights` (the
 * rights written out by hand in tests/integration/authorization-matrix.test.ts,
 * which must equal lib/auth/permissions.ts).
 */
import { beforeAll, beforeEach, describe, expect, it } from "vitest";
import { roles, type Role } from "@/db/schema";
import type { Permission } from "@/lib/auth/permissions";
import { createTeam, signInAs, type TeamFixture } from "./fixtures";
import { freshRequest } from "./request";

export type Outcome = string;

const everyone: Role[] = ["owner", "formulator", "buyer", "production", "viewer"];

// The rights as the product defines them (lib/auth/permissions.ts must say the same).
export const expectedRights: Record<Permission, Role[]> = {
  "workspace.read": everyone,
  "account.manage": everyone,
  "members.manage": ["owner"],
  "workspace.export": ["owner"],
  "workspace.import": ["owner"],
  "ingredients.read": everyone,
  "ingredients.edit": ["owner", "formulator"],
  "suppliers.edit": ["owner", "buyer"],
  "recipes.read": ["owner", "formulator", "buyer", "viewer"],
  "recipes.readReleased": everyone,
  "recipes.edit": ["owner", "formulator"],
  "lots.read": everyone,
  "lots.edit": ["owner", "buyer"],
  "lots.process": ["owner", "production"],
  "batches.read": everyone,
  "batches.plan": ["owner", "production"],
  "purchases.manage": ["owner", "buyer"],
  "machines.manage": ["owner", "production"],
  "costs.read": ["owner", "buyer", "formulator"],
  "costs.edit": ["owner", "buyer"],
};

export type MatrixContext = { team: TeamFixture; other: TeamFixture; caller: Role | "signed-out" | "outsider" };

export type MatrixRow = {
  name: string;
  permission: Permission;
  /**
   * What the owner of another workspace gets when aiming at this workspace's
   * rows: "not_found" for anything addressed by id, "ok" for actions that only
   * ever touch the caller's own workspace (lists, creating new rows).
   */
  outsider: "ok" | "not_found";
  /** Runs the action once; prepares whatever it needs itself (fresh rows each call). */
  run: (ctx: MatrixContext) => Promise<Outcome>;
};

export const base = "http://127.0.0.1:3000";
export const params = (p: Record<string, string> = {}) => ({ params: Promise.resolve(p) });

/** A same-origin JSON request, as the app's own pages send. */
export function jsonRequest(method: string, path: string, body?: unknown): Request {
  return new Request(`${base}${path}`, {
    method,
    headers: { "content-type": "application/json", origin: base, host: "127.0.0.1:3000", "sec-fetch-site": "same-origin" },
    body: body === undefined ? undefined : JSON.stringify(body),
  });
}

/** A route handler's status as an outcome name. */
export const fromStatus = (s: number): Outcome =>
  ({ 200: "ok", 201: "ok", 401: "unauthenticated", 403: "forbidden", 404: "not_found", 409: "conflict", 422: "invalid" })[s] ??
  `http ${s}`;

/** An action result as an outcome name. */
export const fromResult = (r: { ok: boolean; code?: string }): Outcome => (r.ok ? "ok" : (r.code ?? "error"));

/** A FormData from a plain object. */
export function form(o: Record<string, string>): FormData {
  const f = new FormData();
  for (const [k, v] of Object.entries(o)) f.set(k, v);
  return f;
}

export function expectedOutcome(row: MatrixRow, caller: MatrixContext["caller"]): Outcome {
  if (caller === "signed-out") return "unauthenticated";
  if (caller === "outsider") return expectedRights[row.permission].includes("owner") ? row.outsider : "forbidden";
  return expectedRights[row.permission].includes(caller) ? "ok" : "forbidden";
}

/** Declares the matrix tests for `rows` (call at the top level of a test file). */
export function runMatrix(label: string, rows: MatrixRow[]): void {
  let team: TeamFixture;
  let other: TeamFixture;
  beforeAll(async () => {
    team = await createTeam(`${label}-m`);
    other = await createTeam(`${label}-o`);
  });
  const callers: MatrixContext["caller"][] = [...roles, "signed-out", "outsider"];
  describe.each(rows)(`${label}: $name`, (row) => {
    beforeEach(() => freshRequest());
    it.each(callers)("as %s", async (caller) => {
      if (caller === "outsider") await signInAs(other.people.owner.id, other.workspaceId);
      else if (caller !== "signed-out") await signInAs(team.people[caller].id, team.workspaceId);
      expect(await row.run({ team, other, caller })).toBe(expectedOutcome(row, caller));
    });
  });
}
