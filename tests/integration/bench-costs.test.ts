import { beforeAll, beforeEach, describe, expect, it } from "vitest";
import { loadBenchData } from "@/app/(app)/recipes/[recipeId]/bench-data";
import { GET as getVersionRoute } from "@/app/api/recipes/[recipeId]/versions/[versionRef]/route";
import { POST as evaluateRoute } from "@/app/api/recipes/evaluate/route";
import { getViewer } from "@/lib/auth/current";
import { setShowCostsToAll } from "@/lib/data/cost-visibility";
import { getRecipe } from "@/lib/data/recipes";
import { saveRecipeVersion } from "@/lib/data/recipes-save";
import { costedRecipe } from "../support/costing";
import { createTeam, signInAs, type TeamFixture } from "../support/fixtures";
import { createTestLot } from "../support/lots";
import { darkLines } from "../support/recipe-fixtures";
import { base, jsonRequest, params } from "../support/matrix";
import { freshRequest } from "../support/request";

let team: TeamFixture;
let recipeId: string;
let nibsId: string;
let lotId: string;

beforeAll(async () => {
  team = await createTeam("bench-costs");
  const costed = await costedRecipe(team);
  recipeId = costed.recipeId;
  nibsId = costed.ids.nibs;
  // A version saved now that the quotes exist, so it keeps their prices.
  const { latestVersionNo } = await getRecipe({ workspaceId: team.workspaceId, recipeId });
  await saveRecipeVersion({ workspaceId: team.workspaceId, authorId: team.people.formulator.id, recipeId, baseVersionNo: latestVersionNo, barMassGrams: "70", lines: darkLines(costed.ids, "64") });
  // 100 kg of beans for 500 EUR, nothing processed yet: nibs estimated at the workspace's 78 % = 78 kg → 500 / 78 = 6.4102564… EUR/kg.
  lotId = (await createTestLot(team.workspaceId)).id;
});
beforeEach(() => freshRequest());

async function benchAs(role: "formulator" | "viewer") {
  await signInAs(team.people[role].id, team.workspaceId);
  const viewer = (await getViewer())!;
  const recipe = await getRecipe({ workspaceId: team.workspaceId, recipeId });
  return loadBenchData({ viewer, recipe, on: new Date("2026-12-01T12:00:00Z") });
}

describe("the bench page's data", () => {
  it("gives a formulator prices and the lots whose nibs can price a line, an unwinnowed lot as an estimate", async () => {
    const data = await benchAs("formulator");
    expect(data.showCosts).toBe(true);
    expect(data.library.find((i) => i.id === nibsId)?.pricePerKg).toMatch(/^16\.2/);
    const lot = data.lotSources.find((s) => s.lotId === lotId);
    expect(lot).toMatchObject({ estimated: true });
    expect(lot?.perKg).toMatch(/^6\.41025641/);
  });

  it("sends a viewer not a single price: no cost panel, no lot costs, a library without prices", async () => {
    await setShowCostsToAll({ workspaceId: team.workspaceId, show: false });
    const data = await benchAs("viewer");
    expect(data.showCosts).toBe(false);
    expect(data.lotSources).toEqual([]);
    expect(data.library.length).toBeGreaterThan(3);
    expect(data.library.every((i) => i.pricePerKg === null)).toBe(true);
    expect(JSON.stringify(data)).not.toMatch(/"(pricePerKg|perKg)":"/);
  });

  it("shows a viewer the costs once the owner shares them with everyone", async () => {
    await setShowCostsToAll({ workspaceId: team.workspaceId, show: true });
    const data = await benchAs("viewer");
    expect(data.showCosts).toBe(true);
    expect(data.library.find((i) => i.id === nibsId)?.pricePerKg).toMatch(/^16\.2/);
    expect(data.lotSources.map((s) => s.lotId)).toContain(lotId);
    await setShowCostsToAll({ workspaceId: team.workspaceId, show: false });
  });
});

describe("the bench's JSON routes", () => {
  const latest = async () => (await getVersionRoute(new Request(`${base}/api/recipes/${recipeId}/versions/latest`), params({ recipeId, versionRef: "latest" }))).json();
  const evaluate = async () =>
    (await evaluateRoute(jsonRequest("POST", "/api/recipes/evaluate", { lines: [{ ingredientId: nibsId, percent: "100" }], barMassGrams: "70" }), params())).json();
  type VersionJson = { recipe: { costPerBar: string | null }; version: { costPerBar: string | null; lines: { pricePerKg: string | null }[] } };
  type EvaluateJson = { evaluation: { costPerKg?: string }; cost?: unknown };

  it("give a formulator the version's prices and an evaluation's cost", async () => {
    await signInAs(team.people.formulator.id, team.workspaceId);
    const { version } = (await latest()) as VersionJson;
    // The fixture's preferred sugar quote has expired, so the version has line prices but no total.
    expect(version.lines.some((l) => l.pricePerKg !== null)).toBe(true);
    const ev = (await evaluate()) as EvaluateJson;
    expect(ev.evaluation.costPerKg).toMatch(/^16\.2/);
    expect(ev.cost).toBeDefined();
  });

  it("give a viewer the version and the evaluation without a price or a cost", async () => {
    await setShowCostsToAll({ workspaceId: team.workspaceId, show: false });
    await signInAs(team.people.viewer.id, team.workspaceId);
    const body = (await latest()) as VersionJson;
    expect(body.version.lines.length).toBeGreaterThan(0);
    expect(body.version.lines.every((l) => l.pricePerKg === null)).toBe(true);
    expect([body.version.costPerBar, body.recipe.costPerBar]).toEqual([null, null]);
    const ev = (await evaluate()) as EvaluateJson;
    expect(ev.evaluation.costPerKg).toBeUndefined();
    expect(ev.cost).toBeUndefined();
    expect(JSON.stringify(ev)).not.toMatch(/16\.2/);
  });
});
