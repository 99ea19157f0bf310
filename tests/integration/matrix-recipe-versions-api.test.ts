/**
 * POST /api/recipes/:recipeId/versions (the JSON save the load benchmark
 * drives): its role × action matrix row, and what it writes — the same as the
 * bench's save action: the next number, nothing on a stale base, 422 for lines
 * that do not add up, 404 for another workspace's recipe.
 */
import { beforeEach, describe, expect, it } from "vitest";
import { POST as postVersion } from "@/app/api/recipes/[recipeId]/versions/route";
import { createTeam, signInAs } from "../support/fixtures";
import { fromStatus, jsonRequest, params, runMatrix, type MatrixRow } from "../support/matrix";
import { freshRequest, requestState } from "../support/request";
import { darkLines, darkRecipe, referenceIds } from "../support/recipe-fixtures";
import { db } from "@/db/client";
import { recipeVersions } from "@/db/schema";
import { asc, eq } from "drizzle-orm";

function save(recipeId: string, body: unknown) {
  return postVersion(jsonRequest("POST", `/api/recipes/${recipeId}/versions`, body), params({ recipeId }));
}

const rows: MatrixRow[] = [
  {
    name: "POST /api/recipes/:id/versions",
    permission: "recipes.edit",
    outsider: "not_found",
    run: async ({ team }) => {
      const recipeId = await darkRecipe(team);
      const ids = await referenceIds(team.workspaceId);
      return fromStatus((await save(recipeId, { baseVersionNo: 1, barMassGrams: "70", lines: darkLines(ids, "66") })).status);
    },
  },
];

runMatrix("recipe-versions-api", rows);

describe("POST /api/recipes/:recipeId/versions", () => {
  beforeEach(() => freshRequest());

  it("saves the next version with the server's own figures and refreshes the list and the bench", async () => {
    const team = await createTeam("save-api");
    const recipeId = await darkRecipe(team);
    const ids = await referenceIds(team.workspaceId);
    await signInAs(team.people.formulator.id, team.workspaceId);
    const res = await save(recipeId, { baseVersionNo: 1, barMassGrams: "70", note: "less sugar", lines: darkLines(ids, "66") });
    expect(res.status).toBe(201);
    expect(await res.json()).toEqual({ recipeId, versionNo: 2 });
    const versions = await db.select().from(recipeVersions).where(eq(recipeVersions.recipeId, recipeId)).orderBy(asc(recipeVersions.versionNo));
    expect(versions.map((v) => v.versionNo)).toEqual([1, 2]);
    expect(versions[1]!.note).toBe("less sugar");
    expect(versions[1]!.authorId).toBe(team.people.formulator.id);
    expect(requestState.revalidated).toEqual(expect.arrayContaining(["/recipes", `/recipes/${recipeId}`]));
  });

  it("writes nothing and answers 409 when the base is no longer the latest version", async () => {
    const team = await createTeam("save-api-stale");
    const recipeId = await darkRecipe(team);
    const ids = await referenceIds(team.workspaceId);
    await signInAs(team.people.formulator.id, team.workspaceId);
    expect((await save(recipeId, { baseVersionNo: 1, barMassGrams: "70", lines: darkLines(ids, "66") })).status).toBe(201);
    const stale = await save(recipeId, { baseVersionNo: 1, barMassGrams: "70", lines: darkLines(ids, "60") });
    expect(stale.status).toBe(409);
    expect(((await stale.json()) as { error: { message: string } }).error.message).toMatch(/v2 was saved since you started from v1/);
    const count = await db.$count(recipeVersions, eq(recipeVersions.recipeId, recipeId));
    expect(count).toBe(2);
  });

  it("gives every one of 20 simultaneous saves from the same base a clear answer: one 201, nineteen 409, no duplicate", async () => {
    const team = await createTeam("save-api-race");
    const recipeId = await darkRecipe(team);
    const ids = await referenceIds(team.workspaceId);
    await signInAs(team.people.formulator.id, team.workspaceId);
    const statuses = await Promise.all(
      Array.from({ length: 20 }, (_, i) => save(recipeId, { baseVersionNo: 1, barMassGrams: "70", lines: darkLines(ids, String(60 + (i % 8))) }).then((r) => r.status)),
    );
    expect(statuses.filter((s) => s === 201)).toHaveLength(1);
    expect(statuses.filter((s) => s === 409)).toHaveLength(19);
    const versions = await db.select({ n: recipeVersions.versionNo }).from(recipeVersions).where(eq(recipeVersions.recipeId, recipeId));
    expect(versions.map((v) => v.n).sort()).toEqual([1, 2]);
  });

  it("refuses lines that do not add up to 100 % with 422 and the reason", async () => {
    const team = await createTeam("save-api-bad");
    const recipeId = await darkRecipe(team);
    const ids = await referenceIds(team.workspaceId);
    await signInAs(team.people.formulator.id, team.workspaceId);
    const lines = darkLines(ids, "66").map((l, i) => (i === 0 ? { ...l, percent: "70" } : l));
    const res = await save(recipeId, { baseVersionNo: 1, barMassGrams: "70", lines });
    expect(res.status).toBe(422);
    expect(JSON.stringify(await res.json())).toMatch(/add up to 104 %/);
  });

  it("answers 404 for a path that is not a recipe id", async () => {
    const team = await createTeam("save-api-path");
    await signInAs(team.people.formulator.id, team.workspaceId);
    const ids = await referenceIds(team.workspaceId);
    const res = await save("not-a-uuid", { baseVersionNo: 1, barMassGrams: "70", lines: darkLines(ids, "66") });
    expect(res.status).toBe(404);
  });
});
