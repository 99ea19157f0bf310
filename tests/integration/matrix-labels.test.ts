/**
 * Role × action matrix for labels: the label settings action and the label
 * download route, as each role, signed out, and as another workspace's owner
 * (tests/support/matrix.ts). The route prints for real with Chromium, against a
 * stand-in print page (tests/support/label-print-stub.ts).
 */
import { afterAll, beforeAll } from "vitest";
import { saveLabelSettingsAction } from "@/app/(app)/recipes/[recipeId]/label/actions";
import { GET as getLabelFile } from "@/app/api/labels/[recipeId]/route";
import { releaseVersion } from "@/lib/data/recipes-releases";
import { startPrintStub, type PrintStub } from "../support/label-print-stub";
import { form, fromResult, fromStatus, jsonRequest, params, runMatrix, type MatrixContext, type MatrixRow } from "../support/matrix";
import { darkRecipe } from "../support/recipe-fixtures";

/** A fresh dark recipe of the matrix team with v1 released (what production may see). */
async function releasedDark({ team }: MatrixContext): Promise<string> {
  const recipeId = await darkRecipe(team);
  await releaseVersion({ workspaceId: team.workspaceId, userId: null, recipeId, versionNo: 1 });
  return recipeId;
}

let stub: PrintStub;
beforeAll(async () => {
  stub = await startPrintStub();
  process.env.BARWRIGHT_INTERNAL_ORIGIN = stub.origin;
});
afterAll(async () => {
  delete process.env.BARWRIGHT_INTERNAL_ORIGIN;
  await stub.close();
});

const rows: MatrixRow[] = [
  {
    name: "saveLabelSettingsAction",
    permission: "recipes.edit",
    outsider: "not_found",
    run: async (ctx) => fromResult(await saveLabelSettingsAction(null, form({ recipeId: await releasedDark(ctx), mayContain: "milk", piecesPerBar: "", euPortionGrams: "" }))),
  },
  {
    name: "GET /api/labels/:recipeId",
    permission: "recipes.readReleased",
    outsider: "not_found",
    run: async (ctx) => {
      const recipeId = await releasedDark(ctx);
      return fromStatus((await getLabelFile(jsonRequest("GET", `/api/labels/${recipeId}?format=png`), params({ recipeId }))).status);
    },
  },
];

runMatrix("labels", rows);
