import { beforeAll, beforeEach, describe, expect, it } from "vitest";
import { POST as postLeastCost } from "@/app/api/least-cost/route";
import { GET as getSolverWasm } from "@/app/api/least-cost/highs.wasm/route";
import { createTeam, signInAs, type TeamFixture } from "../support/fixtures";
import { base, fromStatus, jsonRequest, params, runMatrix, type MatrixContext, type MatrixRow } from "../support/matrix";
import { freshRequest } from "../support/request";
import { referenceIds } from "../support/recipe-fixtures";

/** A 70 % dark of the team's reference ingredients (EU Directive 2000/36/EC Annex I A.3(a) category). */
async function darkRequest(workspaceId: string) {
  const ids = await referenceIds(workspaceId);
  return {
    lines: [
      { ingredientId: ids.nibs, percent: "62" },
      { ingredientId: ids.butter, percent: "8", min: "8" },
      { ingredientId: ids.sugar, percent: "29.6" },
      { ingredientId: ids.lecithin, percent: "0.4", max: "0.5" },
    ],
    limits: [{ quantity: "totalDryCocoaSolids", basis: "eu", min: "70" }],
    categories: [{ authority: "EU", category: "chocolate" }],
  };
}

const rows: MatrixRow[] = [
  {
    name: "POST /api/least-cost",
    // recipes.read, narrowed to those who may see costs (the cheapest mix is a price; lib/auth/costs.ts):
    // costs.read while the owner has not shared costs (the shared case: matrix-cost-visibility.test.ts).
    permission: "costs.read",
    outsider: "ok", // computes with the caller's own library; nothing of the team's is read
    run: async ({ team, other, caller }: MatrixContext) => {
      const workspaceId = caller === "outsider" ? other.workspaceId : team.workspaceId;
      return fromStatus((await postLeastCost(jsonRequest("POST", "/api/least-cost", await darkRequest(workspaceId)), params())).status);
    },
  },
  {
    name: "GET /api/least-cost/highs.wasm",
    permission: "recipes.read",
    outsider: "ok", // the solver's binary: no workspace data
    run: async () => fromStatus((await getSolverWasm(new Request(`${base}/api/least-cost/highs.wasm`), params())).status),
  },
];

runMatrix("least-cost", rows);

describe("POST /api/least-cost", () => {
  let team: TeamFixture;
  beforeAll(async () => {
    team = await createTeam("least-cost-api");
  });
  beforeEach(async () => {
    freshRequest();
    await signInAs(team.people.formulator.id, team.workspaceId);
  });

  it("says which lines have no price instead of guessing a cost", async () => {
    // The reference ingredients carry no quote in a fresh workspace.
    const res = await postLeastCost(jsonRequest("POST", "/api/least-cost", await darkRequest(team.workspaceId)), params());
    expect(res.status).toBe(200);
    const body = (await res.json()) as { result: { ok: boolean; kind: string; message: string } };
    expect(body.result).toMatchObject({ ok: false, kind: "invalid" });
    expect(body.result.message).toContain("no price per kg");
  });

  it("refuses ingredients of another workspace", async () => {
    const other = await createTeam("least-cost-other");
    const res = await postLeastCost(jsonRequest("POST", "/api/least-cost", await darkRequest(other.workspaceId)), params());
    expect(res.status).toBe(422);
  });

  it("refuses an unknown category and a percent above 100 with field messages", async () => {
    const request = await darkRequest(team.workspaceId);
    const res = await postLeastCost(
      jsonRequest("POST", "/api/least-cost", { ...request, categories: [{ authority: "EU", category: "nougat" }], lines: [{ ...request.lines[0], max: "120" }] }),
      params(),
    );
    expect(res.status).toBe(422);
    const text = JSON.stringify(await res.json());
    expect(text).toContain("That is not a standards category of this authority.");
    expect(text).toContain("A percent cannot be above 100.");
  });

  it("serves the solver's WebAssembly", async () => {
    const res = await getSolverWasm(new Request(`${base}/api/least-cost/highs.wasm`), params());
    expect(res.headers.get("content-type")).toBe("application/wasm");
    const bytes = new Uint8Array(await res.arrayBuffer());
    expect([...bytes.slice(0, 4)]).toEqual([0x00, 0x61, 0x73, 0x6d]); // "\0asm", the WebAssembly magic number
  });
});
