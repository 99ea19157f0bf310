import { sql } from "drizzle-orm";
import { beforeAll, describe, expect, it } from "vitest";
import { POST as postEvaluate } from "@/app/api/recipes/evaluate/route";
import { GET as getRecipes } from "@/app/api/recipes/route";
import { GET as getVersion } from "@/app/api/recipes/[recipeId]/versions/[versionRef]/route";
import { db } from "@/db/client";
import { listRecipes } from "@/lib/data/recipes-list";
import { recipeListQuerySchema, type RecipeListQuery } from "@/lib/validation/recipes";
import { createTeam, signInAs, type TeamFixture } from "../support/fixtures";
import { base, jsonRequest, params } from "../support/matrix";
import { freshRequest } from "../support/request";
import { darkRecipe, referenceIds } from "../support/recipe-fixtures";

const query = (q: Partial<RecipeListQuery> = {}) => recipeListQuerySchema.parse(q);

/**
 * 10,000 recipes written straight into `recipes` (the list reads nothing else):
 * names "Bar 00000"…, types cycling dark/milk/white/other, every third one
 * released, cocoa 30–89.99 %, cost per bar missing on every seventh.
 */
async function bulkRecipes(workspaceId: string): Promise<void> {
  await db.execute(sql`
    insert into recipes (workspace_id, name, chocolate_type, bar_mass_grams, latest_version_no, cocoa_percent, cost_per_bar, released_version_no, updated_at)
    select ${workspaceId}, 'Bar ' || lpad(i::text, 5, '0'),
      (array['dark','milk','white','other'])[1 + i % 4]::chocolate_type, 70, 1,
      30 + (i * 37 % 6000) / 100.0,
      case when i % 7 = 0 then null else 1 + (i * 13 % 400) / 100.0 end,
      case when i % 3 = 0 then 1 else null end,
      now() - (i || ' minutes')::interval
    from generate_series(0, 9999) as i`);
  await db.execute(sql`analyze recipes`);
}

describe("the recipe list with 10,000 recipes", () => {
  let team: TeamFixture;
  beforeAll(async () => {
    team = await createTeam("list");
    await bulkRecipes(team.workspaceId);
  });

  it("pages on the server: 25 rows, the total, and the right slice for a late page", async () => {
    const first = await listRecipes({ workspaceId: team.workspaceId, query: query({ sort: "name" }) });
    expect(first).toMatchObject({ total: 10_000, pageCount: 400, page: 1 });
    expect(first.rows.map((r) => r.name).slice(0, 2)).toEqual(["Bar 00000", "Bar 00001"]);
    const late = await listRecipes({ workspaceId: team.workspaceId, query: query({ sort: "name", page: 399 }) });
    expect(late.rows[0]!.name).toBe("Bar 09950");
    expect(late.rows).toHaveLength(25);
  });

  it("searches by name (a typed % is a character, not a wildcard) and filters by type and status", async () => {
    const found = await listRecipes({ workspaceId: team.workspaceId, query: query({ q: "bar 0999" }) });
    expect(found.total).toBe(10);
    expect((await listRecipes({ workspaceId: team.workspaceId, query: query({ q: "%" }) })).total).toBe(0);
    const milk = await listRecipes({ workspaceId: team.workspaceId, query: query({ type: "milk", status: "released" }) });
    // i % 4 = 1 and i % 3 = 0: i ≡ 9 (mod 12), i = 9 + 12k for k = 0…832.
    expect(milk.total).toBe(833);
    expect(milk.rows.every((r) => r.chocolateType === "milk" && r.releasedVersionNo === 1)).toBe(true);
    const drafts = await listRecipes({ workspaceId: team.workspaceId, query: query({ status: "draft" }) });
    expect(drafts.total).toBe(6666);
  });

  it("sorts by cocoa % and cost per bar in both directions, with missing costs last", async () => {
    const cocoa = await listRecipes({ workspaceId: team.workspaceId, query: query({ sort: "cocoa" }) });
    const figures = cocoa.rows.map((r) => Number(r.cocoaPercent));
    expect(figures).toEqual([...figures].sort((a, b) => b - a));
    const cheap = await listRecipes({ workspaceId: team.workspaceId, query: query({ sort: "cost", dir: "asc" }) });
    expect(cheap.rows[0]!.costPerBar).toBe("1.0000");
    const dear = await listRecipes({ workspaceId: team.workspaceId, query: query({ sort: "cost", dir: "desc" }) });
    expect(dear.rows[0]!.costPerBar).toBe("4.9900");
    const last = await listRecipes({ workspaceId: team.workspaceId, query: query({ sort: "cost", dir: "desc", page: 400 }) });
    expect(last.rows.every((r) => r.costPerBar === null)).toBe(true);
  });

  it("answers any page, sort and search within 150 ms", async () => {
    const cases: Partial<RecipeListQuery>[] = [
      { sort: "updated" },
      { sort: "name", page: 400 },
      { sort: "cocoa", dir: "asc", page: 200 },
      { sort: "cost", dir: "desc", page: 390 },
      { q: "bar 05", sort: "name" },
      { type: "white", status: "released", sort: "cocoa" },
    ];
    for (const c of cases) {
      const started = performance.now();
      await listRecipes({ workspaceId: team.workspaceId, query: query(c) });
      const ms = performance.now() - started;
      expect(ms, JSON.stringify(c)).toBeLessThan(150);
    }
  });
});

describe("the recipes JSON API", () => {
  let team: TeamFixture;
  beforeAll(async () => {
    team = await createTeam("api");
  });

  it("refuses a bad list query with 422 and the field", async () => {
    freshRequest();
    await signInAs(team.people.viewer.id, team.workspaceId);
    const res = await getRecipes(new Request(`${base}/api/recipes?sort=price&page=0`), params());
    expect(res.status).toBe(422);
    const body = (await res.json()) as { error: { fieldErrors: Record<string, string[]> } };
    expect(Object.keys(body.error.fieldErrors).sort()).toEqual(["page", "sort"]);
  });

  it("reads a version with its saved lines and the engine's output, and 404s a version that does not exist", async () => {
    const recipeId = await darkRecipe(team);
    freshRequest();
    await signInAs(team.people.buyer.id, team.workspaceId);
    const res = await getVersion(new Request(`${base}/api/recipes/x/versions/latest`), params({ recipeId, versionRef: "latest" }));
    const body = (await res.json()) as { version: { versionNo: number; lines: { name: string; percent: string }[]; evaluation: { composition: { totalDryCocoaSolids: string } } } };
    expect(body.version.versionNo).toBe(1);
    expect(body.version.lines.map((l) => `${l.name} ${l.percent}`)).toEqual([
      "Cocoa nibs (roasted) 64.0000",
      "Cocoa butter 7.3000",
      "Sugar (sucrose) 28.4000",
      "Soy lecithin 0.3000",
    ]);
    expect(body.version.evaluation.composition.totalDryCocoaSolids).toBe("70.02");
    expect((await getVersion(new Request(`${base}/api/recipes/x/versions/7`), params({ recipeId, versionRef: "7" }))).status).toBe(404);
    expect((await getVersion(new Request(`${base}/api/recipes/x/versions/abc`), params({ recipeId, versionRef: "abc" }))).status).toBe(404);
  });

  it("evaluates a recipe of library and inline ingredients, with cost per bar, and validates the body", async () => {
    const ids = await referenceIds(team.workspaceId);
    freshRequest();
    await signInAs(team.people.formulator.id, team.workspaceId);
    const res = await postEvaluate(
      jsonRequest("POST", "/api/recipes/evaluate", {
        lines: [
          { ingredientId: ids.nibs, percent: 60 },
          { ingredientId: ids.butter, percent: "10" },
          { ingredient: { name: "House sugar", sugar: "100", pricePerKg: "1.20" }, percent: "30" },
        ],
        authorities: ["EU"],
        barMassGrams: "80",
      }),
      params(),
    );
    expect(res.status).toBe(200);
    type Brief = { authority: string; category: string; pass: boolean; failed: { quantity: string; minimum?: string; shortBy?: string }[]; checks?: unknown };
    const body = (await res.json()) as { evaluation: { composition: Record<string, string>; standards: Brief[] }; cost: { ok: boolean } };
    // REFERENCE.md §2 worked example: 60 % nibs (55 % butter, 2 % water) + 10 % butter + 30 % sugar = 68.8 % dry cocoa solids.
    expect(body.evaluation.composition.totalDryCocoaSolids).toBe("68.8");
    expect(body.evaluation.composition.cocoaSolidsStatement).toBe("68");
    expect(new Set(body.evaluation.standards.map((s) => s.authority))).toEqual(new Set(["EU"]));
    expect(body.cost.ok).toBe(false); // the library ingredients have no quote in this workspace

    // The standards in brief by default: Directive 2000/36/EC Annex I A.4(a), milk chocolate needs ≥ 14 % dry milk solids; this bar has none.
    const milk = body.evaluation.standards.find((s) => s.category === "milk chocolate")!;
    expect(milk.pass).toBe(false);
    expect(milk.failed).toContainEqual(expect.objectContaining({ quantity: "dryMilkSolids", minimum: "14", shortBy: "14" }));
    expect(milk.checks).toBeUndefined();
    // Directive 2000/36/EC Annex I A.3(a): chocolate ≥ 35 % dry cocoa solids, ≥ 18 % cocoa butter, ≥ 14 % fat-free: all met.
    expect(body.evaluation.standards.find((s) => s.category === "chocolate")).toMatchObject({ pass: true, failed: [] });

    // Every check with its wording on request.
    const full = await postEvaluate(
      jsonRequest("POST", "/api/recipes/evaluate", { lines: [{ ingredientId: ids.nibs, percent: "70" }, { ingredientId: ids.butter, percent: "30" }], authorities: ["EU"], standards: "full" }),
      params(),
    );
    const fullBody = (await full.json()) as { evaluation: { standards: { category: string; checks: { label: string; clause: string }[] }[] } };
    expect(fullBody.evaluation.standards.find((s) => s.category === "chocolate")!.checks).toContainEqual(
      expect.objectContaining({ label: "total dry cocoa solids ≥ 35 %", clause: "Directive 2000/36/EC Annex I A.3(a)" }),
    );
    const wrongDetail = await postEvaluate(jsonRequest("POST", "/api/recipes/evaluate", { lines: [{ ingredientId: ids.nibs, percent: "100" }], standards: "all" }), params());
    expect(wrongDetail.status).toBe(422);
    expect(((await wrongDetail.json()) as { error: { fieldErrors: Record<string, string[]> } }).error.fieldErrors.standards).toEqual(['Standards are "summary" or "full".']);

    const bad = await postEvaluate(jsonRequest("POST", "/api/recipes/evaluate", { lines: [{ percent: "120" }], authorities: ["Mars"] }), params());
    expect(bad.status).toBe(422);
    const unknown = await postEvaluate(
      jsonRequest("POST", "/api/recipes/evaluate", { lines: [{ ingredientId: "00000000-0000-4000-8000-000000000000", percent: "100" }] }),
      params(),
    );
    expect(unknown.status).toBe(422);
  });
});
