/**
 * Who gets money figures: production and viewers get none from any route
 * handler, CSV export or page loader while the owner's "show costs to
 * everyone" setting is off, and the same figures as the buyer once it is on.
 * The rule is the product's own (issue: "production and viewer do not see
 * prices unless the owner allows it"); no outside source.
 */
import { beforeAll, beforeEach, describe, expect, it } from "vitest";
import { GET as getIngredients } from "@/app/api/ingredients/route";
import { GET as getLot } from "@/app/api/lots/[lotId]/route";
import { GET as getLots } from "@/app/api/lots/route";
import { GET as getCurrentPrices } from "@/app/api/prices/current/route";
import { GET as exportQuotes } from "@/app/api/quotes/export/route";
import { GET as getQuotes } from "@/app/api/quotes/route";
import { GET as getRecipes } from "@/app/api/recipes/route";
import { setShowCostsToAll } from "@/lib/data/cost-visibility";
import { getIngredientPriceForViewer } from "@/lib/cost-visibility/ingredients";
import { getLotForViewer, listLotsForViewer } from "@/lib/cost-visibility/lots";
import { getPurchaseOrderForViewer, materialRequirementsForViewer } from "@/lib/cost-visibility/purchasing";
import { getVersionForViewer, listRecipesForViewer, listVersionsForViewer } from "@/lib/cost-visibility/recipes";
import { recipeListQuerySchema } from "@/lib/validation/recipes";
import { pricedWorkspace, viewerOf } from "../support/cost-visibility";
import { createTeam, signInAs, type TeamFixture } from "../support/fixtures";
import { base, params } from "../support/matrix";
import { freshRequest } from "../support/request";

let team: TeamFixture;
let fx: Awaited<ReturnType<typeof pricedWorkspace>>;
beforeAll(async () => {
  team = await createTeam("costvis");
  fx = await pricedWorkspace(team);
});

const get = (path: string) => new Request(`${base}${path}`);
const json = async (res: Response) => {
  expect(res.status).toBe(200);
  return res.json();
};

// Every key under which a money figure travels, with a value that is not null.
const MONEY_KEYS = /"(currentPrice|pricePerKg|pricePaid|price|amount|nibCost|processingCost|costPerBar|costPerKg|perKgBase|totals)":(?!null|\{\}|\[\])/;

describe.each(["production", "viewer"] as const)("%s", (role) => {
  const viewer = () => viewerOf(team, role);
  beforeEach(async () => {
    freshRequest();
    await signInAs(team.people[role].id, team.workspaceId);
  });

  describe("while the owner keeps costs to the cost roles", () => {
    beforeAll(() => setShowCostsToAll({ workspaceId: team.workspaceId, show: false }));

    it("gets the ingredient library without a single price", async () => {
      const body = await json(await getIngredients(get("/api/ingredients"), params()));
      expect(body.pricesShown).toBe(false);
      expect(body.ingredients.length).toBeGreaterThan(3);
      expect(JSON.stringify(body)).not.toMatch(MONEY_KEYS);
      expect(await getIngredientPriceForViewer({ viewer: viewer(), ingredientId: fx.ids.sugar, on: "2026-12-01" })).toEqual({ shown: false });
    });

    it("is refused quotes, their CSV and current prices", async () => {
      expect((await getQuotes(get("/api/quotes"), params())).status).toBe(403);
      expect((await exportQuotes(get("/api/quotes/export"), params())).status).toBe(403);
      expect((await getCurrentPrices(get(`/api/prices/current?ingredientIds=${fx.ids.sugar}`), params())).status).toBe(403);
    });

    it("gets bean lots with masses and yields but no price paid, extra cost, processing cost or nib cost", async () => {
      const list = await json(await getLots(get("/api/lots"), params()));
      expect(list.costsShown).toBe(false);
      expect(list.lots.find((l: { id: string }) => l.id === fx.lotId)).toMatchObject({ massReceivedKg: "100.000", nibCost: null });
      const detail = await json(await getLot(get(`/api/lots/${fx.lotId}`), params({ lotId: fx.lotId })));
      expect(detail).toMatchObject({ costsShown: false, costs: [], nibCost: null, processingCost: null, lot: { pricePaid: null, massReceivedKg: "100.000" } });
      expect(detail.records[0].record).toMatchObject({ step: "roasting", massOutKg: "95.000", cost: null });
      expect(JSON.stringify([list, detail])).not.toMatch(MONEY_KEYS);
      expect((await getLotForViewer({ viewer: viewer(), lotId: fx.lotId })).nibCost).toBeNull();
      expect((await listLotsForViewer({ viewer: viewer() })).lots.every((l) => l.nibCost === null)).toBe(true);
    });

    it("gets the recipe list without a cost per bar, and a cost sort falls back to the default order", async () => {
      const body = await json(await getRecipes(get("/api/recipes?sort=cost"), params()));
      expect(body.costsShown).toBe(false);
      expect(body.rows.some((r: { id: string }) => r.id === fx.pricedRecipeId)).toBe(true);
      expect(body.rows.every((r: { costPerBar: unknown }) => r.costPerBar === null)).toBe(true);
      const page = await listRecipesForViewer({ viewer: viewer(), query: recipeListQuerySchema.parse({ sort: "cost", dir: "desc" }) });
      expect(page.query).toMatchObject({ sort: "updated", dir: undefined });
    });

    it("gets saved versions without line prices or costs (history, compare, version pages)", async () => {
      const { version, costsShown } = await getVersionForViewer({ viewer: viewer(), recipeId: fx.pricedRecipeId, versionNo: 1 });
      expect(costsShown).toBe(false);
      expect(version).toMatchObject({ costPerKg: null, costPerBar: null });
      expect(version.lines.every((l) => l.pricePerKg === null)).toBe(true);
      expect(version.evaluation.costPerKg).toBeUndefined();
      expect(version.evaluation.composition).toBeDefined();
      const { versions } = await listVersionsForViewer({ viewer: viewer(), recipe: { id: fx.pricedRecipeId } });
      expect(versions.map((v) => v.costPerBar)).toEqual([null]);
    });

    it("gets material requirements and purchase orders with quantities but no prices, amounts or totals", async () => {
      const { groups, costsShown } = await materialRequirementsForViewer({ viewer: viewer(), batchIds: [fx.batchId] });
      expect(costsShown).toBe(false);
      const lines = groups.flatMap((g) => g.lines);
      expect(lines.length).toBeGreaterThan(0);
      expect(lines.some((l) => l.quote !== null)).toBe(true);
      expect(lines.every((l) => l.amount === null && (l.quote === null || l.quote.price === null))).toBe(true);
      const { order } = await getPurchaseOrderForViewer({ viewer: viewer(), orderId: fx.orderId });
      expect(order.totals).toEqual({});
      expect(order.lines[0]).toMatchObject({ quantityKg: "10", price: null, amount: null });
    });
  });

  describe("once the owner shares costs with everyone", () => {
    beforeAll(() => setShowCostsToAll({ workspaceId: team.workspaceId, show: true }));

    it("gets the library's current prices", async () => {
      const body = await json(await getIngredients(get("/api/ingredients"), params()));
      expect(body.pricesShown).toBe(true);
      // Sugar's preferred supplier quotes 1.30 EUR/kg with no end date (tests/support/costing.ts).
      expect(body.ingredients.find((i: { id: string }) => i.id === fx.ids.sugar).currentPrice).toMatchObject({ status: "priced", pricePerKg: "1.3" });
      expect(await getIngredientPriceForViewer({ viewer: viewer(), ingredientId: fx.ids.sugar, on: "2026-12-01" })).toMatchObject({ shown: true, price: { pricePerKg: "1.3" } });
    });

    it("gets quotes, their CSV and current prices", async () => {
      expect((await json(await getQuotes(get(`/api/quotes?ingredientId=${fx.ids.sugar}`), params()))).quotes.length).toBe(2);
      const csv = await exportQuotes(get(`/api/quotes/export?ingredientId=${fx.ids.sugar}`), params());
      expect(csv.status).toBe(200);
      expect(await csv.text()).toContain('"985"');
      expect((await json(await getCurrentPrices(get(`/api/prices/current?ingredientIds=${fx.ids.sugar}`), params()))).prices[fx.ids.sugar].pricePerKg).toBe("1.3");
    });

    it("gets the lot's money: price paid, freight, roasting cost and nib cost", async () => {
      const detail = await json(await getLot(get(`/api/lots/${fx.lotId}`), params({ lotId: fx.lotId })));
      // No winnowing yet: nibs estimated at 78 % of 100 kg = 78 kg; (500 + 40 + 12) / 78 = 7.0769… EUR/kg.
      expect(detail).toMatchObject({ costsShown: true, lot: { pricePaid: "500.0000" }, processingCost: "12.0000", costs: [{ label: "Freight", amount: "40.0000" }] });
      expect(detail.nibCost.perKg.slice(0, 6)).toBe("7.0769");
      const list = await json(await getLots(get("/api/lots"), params()));
      expect(list.lots.find((l: { id: string }) => l.id === fx.lotId).nibCost.perKg.slice(0, 6)).toBe("7.0769");
    });

    it("gets the recipe list with costs per bar, sorted by cost when asked", async () => {
      const body = await json(await getRecipes(get("/api/recipes?sort=cost"), params()));
      expect(body.costsShown).toBe(true);
      expect(body.rows.find((r: { id: string }) => r.id === fx.pricedRecipeId).costPerBar).toMatch(/^\d+\.\d+$/);
      const page = await listRecipesForViewer({ viewer: viewer(), query: recipeListQuerySchema.parse({ sort: "cost" }) });
      expect(page.query.sort).toBe("cost");
    });

    it("gets saved versions with their prices and costs", async () => {
      const { version } = await getVersionForViewer({ viewer: viewer(), recipeId: fx.pricedRecipeId, versionNo: 1 });
      expect(version.costPerBar).toMatch(/^\d+\.\d+$/);
      expect(version.lines.find((l) => l.ingredientId === fx.ids.sugar)?.pricePerKg).toBe("1.3000");
    });

    it("gets requirement prices and the order's value", async () => {
      const { groups } = await materialRequirementsForViewer({ viewer: viewer(), batchIds: [fx.batchId] });
      expect(groups.flatMap((g) => g.lines).some((l) => l.quote?.price && l.amount)).toBe(true);
      // 10 kg at EUR 2.50 per kg (tests/support/purchases.ts).
      const { order } = await getPurchaseOrderForViewer({ viewer: viewer(), orderId: fx.orderId });
      expect(order.totals).toEqual({ EUR: "25" });
    });
  });
});
