/**
 * Role × action matrix for recipes: every server action and route handler of
 * the recipes feature, called as each role, signed out, and as another
 * workspace's owner (tests/support/matrix.ts).
 */
import { describe, expect, it } from "vitest";
import { createRecipeAction } from "@/app/(app)/recipes/actions";
import {
  forkRecipeVersionAction,
  releaseRecipeVersionAction,
  restoreRecipeVersionAction,
  saveRecipeVersionAction,
  updateRecipeDetailsAction,
} from "@/app/(app)/recipes/[recipeId]/actions";
import { POST as postEvaluate } from "@/app/api/recipes/evaluate/route";
import { GET as getRecipes } from "@/app/api/recipes/route";
import { GET as getVersion } from "@/app/api/recipes/[recipeId]/versions/[versionRef]/route";
import { releaseVersion } from "@/lib/data/recipes-releases";
import { saveRecipeVersion } from "@/lib/data/recipes-save";
import { signInAs, createTeam } from "../support/fixtures";
import { base, form, fromResult, fromStatus, jsonRequest, params, runMatrix, type MatrixContext, type MatrixRow } from "../support/matrix";
import { freshRequest } from "../support/request";
import { darkLines, darkRecipe, referenceIds, uniqueName } from "../support/recipe-fixtures";

/** A fresh dark recipe of the matrix team with v1 and v2 (v1 released). */
async function twoVersions({ team }: MatrixContext) {
  const recipeId = await darkRecipe(team);
  const ids = await referenceIds(team.workspaceId);
  await saveRecipeVersion({ workspaceId: team.workspaceId, authorId: null, recipeId, baseVersionNo: 1, barMassGrams: "70", lines: darkLines(ids, "65") });
  await releaseVersion({ workspaceId: team.workspaceId, userId: null, recipeId, versionNo: 1 });
  return { recipeId, ids };
}

const rows: MatrixRow[] = [
  {
    name: "createRecipeAction",
    permission: "recipes.edit",
    outsider: "ok", // creates in the caller's own workspace
    run: async () =>
      fromResult(await createRecipeAction(null, form({ name: uniqueName("New"), chocolateType: "dark", barMassGrams: "70", start: "scratch" }))),
  },
  {
    name: "saveRecipeVersionAction",
    permission: "recipes.edit",
    outsider: "not_found",
    run: async (ctx) => {
      const { recipeId, ids } = await twoVersions(ctx);
      return fromResult(await saveRecipeVersionAction({ recipeId, baseVersionNo: 2, barMassGrams: "70", lines: darkLines(ids, "63") }));
    },
  },
  {
    name: "restoreRecipeVersionAction",
    permission: "recipes.edit",
    outsider: "not_found",
    run: async (ctx) => fromResult(await restoreRecipeVersionAction({ recipeId: (await twoVersions(ctx)).recipeId, versionNo: 1, baseVersionNo: 2 })),
  },
  {
    name: "releaseRecipeVersionAction",
    permission: "recipes.edit",
    outsider: "not_found",
    run: async (ctx) => fromResult(await releaseRecipeVersionAction({ recipeId: (await twoVersions(ctx)).recipeId, versionNo: 2 })),
  },
  {
    name: "forkRecipeVersionAction",
    permission: "recipes.edit",
    outsider: "not_found",
    run: async (ctx) =>
      fromResult(await forkRecipeVersionAction({ recipeId: (await twoVersions(ctx)).recipeId, versionNo: 2, name: uniqueName("Fork") })),
  },
  {
    name: "updateRecipeDetailsAction",
    permission: "recipes.edit",
    outsider: "not_found",
    run: async (ctx) => {
      const recipeId = await darkRecipe(ctx.team);
      return fromResult(await updateRecipeDetailsAction(null, form({ recipeId, name: uniqueName("Renamed"), chocolateType: "dark", notes: "" })));
    },
  },
  {
    name: "GET /api/recipes",
    permission: "recipes.readReleased",
    outsider: "ok", // lists the outsider's own recipes
    run: async () => fromStatus((await getRecipes(new Request(`${base}/api/recipes?sort=name`), params())).status),
  },
  {
    name: "GET /api/recipes/:id/versions/:n (a released version)",
    permission: "recipes.readReleased",
    outsider: "not_found",
    run: async (ctx) => {
      const { recipeId } = await twoVersions(ctx);
      return fromStatus((await getVersion(new Request(`${base}/api/recipes/x/versions/1`), params({ recipeId, versionRef: "1" }))).status);
    },
  },
  {
    name: "GET /api/recipes/:id/versions/:n (a version not released)",
    permission: "recipes.read",
    outsider: "not_found",
    run: async (ctx) => {
      const { recipeId } = await twoVersions(ctx);
      return fromStatus((await getVersion(new Request(`${base}/api/recipes/x/versions/2`), params({ recipeId, versionRef: "2" }))).status);
    },
  },
  {
    name: "POST /api/recipes/evaluate",
    permission: "recipes.read",
    outsider: "ok", // evaluates what is sent; touches no row of ours
    run: async () =>
      fromStatus(
        (
          await postEvaluate(
            jsonRequest("POST", "/api/recipes/evaluate", {
              lines: [
                { ingredient: { name: "Cocoa liquor", cocoaButter: "53", cocoaSolidsNonFat: "45", moisture: "2" }, percent: "70" },
                { ingredient: { name: "Sugar", sugar: "100" }, percent: "30" },
              ],
            }),
            params(),
          )
        ).status,
      ),
  },
];

runMatrix("recipes", rows);

describe("what production sees through the API", () => {
  it("lists only released recipes, with the released version's figures", async () => {
    const team = await createTeam("prod-list");
    const ctx = { team, other: team, caller: "production" } as const;
    const { recipeId } = await twoVersions(ctx);
    await darkRecipe(team); // never released
    freshRequest();
    await signInAs(team.people.production.id, team.workspaceId);
    const body = (await (await getRecipes(new Request(`${base}/api/recipes`), params())).json()) as {
      rows: { id: string; versionNo: number; cocoaPercent: string }[];
      total: number;
    };
    expect(body.total).toBe(1);
    // v1 (released) is the starting point's 70.02 %; v2 (65 % nibs) would be 71.0 %.
    expect(body.rows[0]).toMatchObject({ id: recipeId, versionNo: 1, cocoaPercent: "70.0200" });
    const latest = await getVersion(new Request(`${base}/api/recipes/x/versions/latest`), params({ recipeId, versionRef: "latest" }));
    expect(latest.status).toBe(403);
    const released = await getVersion(new Request(`${base}/api/recipes/x/versions/released`), params({ recipeId, versionRef: "released" }));
    expect(((await released.json()) as { version: { versionNo: number } }).version.versionNo).toBe(1);
  });
});
