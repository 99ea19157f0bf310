import { beforeAll, beforeEach, describe, expect, it } from "vitest";
import { loadBenchData } from "@/app/(app)/recipes/[recipeId]/bench-data";
import { getViewer } from "@/lib/auth/current";
import { setShowCostsToAll } from "@/lib/data/cost-visibility";
import { getRecipe } from "@/lib/data/recipes";
import { costedRecipe } from "../support/costing";
import { createTeam, signInAs, type TeamFixture } from "../support/fixtures";
import { createTestLot } from "../support/lots";
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
