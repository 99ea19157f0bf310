/**
 * The overview: what is waiting on the team, on the seeded demo workspace and
 * on fresh teams, read through lib/cost-visibility/overview.ts and its route.
 */
import Decimal from "decimal.js";
import { and, eq } from "drizzle-orm";
import { beforeAll, beforeEach, describe, expect, it } from "vitest";
import { GET as getOverview } from "@/app/api/overview/route";
import { db } from "@/db/client";
import { recipes, type Role } from "@/db/schema";
import { seedDemo } from "@/db/seed";
import type { Viewer } from "@/lib/auth/current";
import { getOverviewForViewer } from "@/lib/cost-visibility/overview";
import { setShowCostsToAll } from "@/lib/data/cost-visibility";
import { loadRecipeCosting } from "@/lib/data/costing";
import { getNibStock } from "@/lib/data/nib-stock";
import { createTeam, signInAs, type TeamFixture } from "../support/fixtures";
import { makeIngredient, makeQuote, makeSupplier } from "../support/ingredients";
import { base, params } from "../support/matrix";
import { insertTestOrder } from "../support/purchases";
import { freshRequest } from "../support/request";

const on = "2026-12-01";
let demo: string;
const viewerOf = (workspaceId: string, role: Role): Viewer => ({
  user: { id: "00000000-0000-4000-8000-000000000000", email: `${role}@overview.example`, name: role },
  workspace: { id: workspaceId, name: "overview" },
  role,
});

beforeAll(async () => {
  demo = (await seedDemo(db)).workspaceId;
});
beforeEach(() => freshRequest());

describe("the overview of the demo workspace", () => {
  it("costs every released bar as the Costing page does, with gross margins on the selling price", async () => {
    const { margins } = await getOverviewForViewer({ viewer: viewerOf(demo, "owner"), on });
    expect(margins?.total).toBe(5);
    expect(margins?.rows.map((m) => m.name)).toEqual([
      "Deep dark 82 %",
      "Harbour milk 45 %",
      "Hazelnut dark, 15 % roasted hazelnuts",
      "House dark 70 %",
      "Quayside white 34 %",
    ]);
    for (const m of margins!.rows) {
      const [recipe] = await db.select().from(recipes).where(and(eq(recipes.workspaceId, demo), eq(recipes.id, m.recipeId)));
      expect(m.versionNo).toBe(recipe!.releasedVersionNo);
      // The same figure as the recipe's Costing page for its released version on that day.
      const costing = await loadRecipeCosting({ workspaceId: demo, recipeId: m.recipeId, versionNo: m.versionNo, on });
      const chosen = costing.report.scenarios.chosen.cost;
      expect(chosen.ok && chosen.costPerBar).toBe(m.costPerBar);
      // Gross margin as a share of the selling price, (price − cost) ÷ price × 100 — the usual accounting
      // definition (common practice, no single source), recomputed here from the cost and the price.
      const margin = new Decimal(m.wholesalePricePerBar!).minus(m.costPerBar!).div(m.wholesalePricePerBar!).times(100);
      expect(m.wholesaleMargin?.ok && new Decimal(m.wholesaleMargin.value).minus(margin).abs().lt("0.0001")).toBe(true);
      expect(m.wholesaleBelowTarget).toBe(margin.lt(m.wholesaleTargetPercent!));
      const retail = new Decimal(m.retailPricePerBar!).minus(m.costPerBar!).div(m.retailPricePerBar!).times(100);
      expect(m.retailBelowTarget).toBe(retail.lt(m.retailTargetPercent!));
      expect(m.currency).toBe("EUR");
    }
  });

  it("lists the planned batch (overdue once its day has passed), the two open orders and the nibs in stock", async () => {
    const owner = viewerOf(demo, "owner");
    const before = await getOverviewForViewer({ viewer: owner, on });
    expect(before.batches.rows.map((b) => [b.code, b.plannedFor, b.totalMassGrams, b.overdue])).toEqual([["B-2026-0002", "2026-12-08", "40000", false]]);
    const after = await getOverviewForViewer({ viewer: owner, on: "2026-12-09" });
    expect(after.batches.rows[0]?.overdue).toBe(true);
    expect(before.orders.total).toBe(2);
    expect(before.orders.rows.map((o) => [o.number, o.status]).sort()).toEqual([
      ["PO-2026-0001", "drafted"],
      ["PO-2026-0002", "sent"],
    ]);
    // Nibs in stock is the sum over the lots of their own stock figures.
    const stock = [...(await getNibStock({ workspaceId: demo })).values()];
    const sum = stock.reduce((s, l) => s.plus(l.inStockKg), new Decimal(0));
    expect(before.beans.nibsInStockKg).toBe(sum.toFixed());
    expect(before.beans.lots.rows.map((l) => [l.code, l.winnowed])).toEqual([
      ["GH-2026-11", false],
      ["MG-2026-03", false],
      ["EC-2026-07", true],
    ]);
  });

  it("has done every first step, so the owner gets no checklist", async () => {
    expect((await getOverviewForViewer({ viewer: viewerOf(demo, "owner"), on })).setup).toBeNull();
  });

  it("lists the recipes saved since their release, and the current quotes older than six months, oldest first", async () => {
    const { unreleased, quotes } = await getOverviewForViewer({ viewer: viewerOf(demo, "owner"), on });
    // Deep dark 82 % is released at its latest version; the four others have a newer saved version.
    expect(unreleased?.total).toBe(4);
    expect(unreleased?.rows.every((r) => r.latestVersionNo > (r.releasedVersionNo ?? 0))).toBe(true);
    expect(unreleased?.rows.map((r) => r.name)).not.toContain("Deep dark 82 %");
    // The demo's open-ended quotes that took effect before 2026-06-01 (183 days before 2026-12-01).
    // Two took effect the same day; their order between them is not part of the rule.
    const listed = quotes!.rows.map((q) => [q.validFrom, q.ingredientName, q.reason]);
    expect(listed.map((r) => r[0])).toEqual(["2026-02-01", "2026-02-01", "2026-03-01", "2026-04-01", "2026-05-01"]);
    expect(listed.sort()).toEqual([
      ["2026-02-01", "Buttermilk powder", "old"],
      ["2026-02-01", "Skim milk powder", "old"],
      ["2026-03-01", "Soy lecithin", "old"],
      ["2026-04-01", "Cocoa powder, 10–12 % fat", "old"],
      ["2026-05-01", "Roasted hazelnuts", "old"],
    ]);
    expect(quotes?.total).toBe(5);
  });
});

describe("what each role gets", () => {
  let team: TeamFixture;
  beforeAll(async () => {
    team = await createTeam("overview");
  });

  it.each([
    ["owner", true, true, true],
    ["formulator", true, true, false],
    ["buyer", true, true, true],
    ["production", false, false, false],
    ["viewer", false, true, false],
  ] as const)("%s: margins %s, unreleased changes %s, prices to check %s", async (role, margins, unreleased, quotes) => {
    const o = await getOverviewForViewer({ viewer: viewerOf(team.workspaceId, role), on });
    expect(o.margins !== null).toBe(margins);
    expect(o.unreleased !== null).toBe(unreleased);
    expect(o.quotes !== null).toBe(quotes);
    expect(o.batches).toEqual({ rows: [], total: 0 });
    expect(o.setup !== null).toBe(role === "owner");
  });

  it("gives the owner of a new workspace its first steps, ticking each as the workspace holds it", async () => {
    const fresh = await createTeam("overview-setup");
    const owner = viewerOf(fresh.workspaceId, "owner");
    const done = async () => Object.fromEntries((await getOverviewForViewer({ viewer: owner, on })).setup!.map((s) => [s.step, s.done]));
    // createTeam gives the workspace one member per role, so only the team step is done.
    expect(await done()).toEqual({ supplier: false, quote: false, recipe: false, release: false, lot: false, batch: false, team: true });
    const supplier = await makeSupplier(fresh.workspaceId);
    const sugar = await makeIngredient(fresh.workspaceId);
    await makeQuote(fresh.workspaceId, fresh.people.buyer.id, { supplierId: supplier.id, ingredientId: sugar.id, price: "1.05", validFrom: "2026-11-01" });
    expect(await done()).toMatchObject({ supplier: true, quote: true, recipe: false });
  });

  it("gives production and viewers the margins once the owner shows costs to everyone", async () => {
    const shared = await createTeam("overview-shared");
    await setShowCostsToAll({ workspaceId: shared.workspaceId, show: true });
    for (const role of ["production", "viewer"] as const) {
      expect((await getOverviewForViewer({ viewer: viewerOf(shared.workspaceId, role), on })).margins).toEqual({ rows: [], total: 0 });
    }
  });

  it("puts a quote ending within 30 days first, leaves it out once renewed, and counts open orders", async () => {
    const quoting = await createTeam("overview-quotes");
    const ws = quoting.workspaceId;
    const buyer = viewerOf(ws, "buyer");
    const supplier = await makeSupplier(ws);
    const sugar = await makeIngredient(ws);
    const butter = await makeIngredient(ws);
    await makeQuote(ws, quoting.people.buyer.id, { supplierId: supplier.id, ingredientId: butter.id, price: "9", validFrom: "2026-01-15" });
    await makeQuote(ws, quoting.people.buyer.id, { supplierId: supplier.id, ingredientId: sugar.id, price: "1.1", validFrom: "2026-11-01", validUntil: "2026-12-20" });
    const first = await getOverviewForViewer({ viewer: buyer, on });
    expect(first.quotes?.rows.map((q) => [q.ingredientId, q.reason])).toEqual([
      [sugar.id, "ends"],
      [butter.id, "old"],
    ]);
    await makeQuote(ws, quoting.people.buyer.id, { supplierId: supplier.id, ingredientId: sugar.id, price: "1.2", validFrom: "2026-12-21" });
    expect((await getOverviewForViewer({ viewer: buyer, on })).quotes?.rows.map((q) => q.ingredientId)).toEqual([butter.id]);

    await insertTestOrder(ws, "drafted");
    await insertTestOrder(ws, "received");
    await insertTestOrder(ws, "cancelled");
    const orders = (await getOverviewForViewer({ viewer: buyer, on })).orders;
    expect(orders.total).toBe(1);
    expect(orders.rows.map((o) => o.status)).toEqual(["drafted"]);
  });

  it("never shows another workspace's rows", async () => {
    const other = await createTeam("overview-other");
    await insertTestOrder(other.workspaceId, "sent");
    const o = await getOverviewForViewer({ viewer: viewerOf(team.workspaceId, "owner"), on });
    expect(o.orders.total).toBe(0);
    expect(o.beans.lots.total).toBe(0);
  });
});

describe("GET /api/overview", () => {
  it("answers for the day asked, and refuses a day that is not one with a clear message", async () => {
    const team = await createTeam("overview-api");
    await signInAs(team.people.owner.id, team.workspaceId);
    const ok = await getOverview(new Request(`${base}/api/overview?on=2026-12-01`), params());
    expect(ok.status).toBe(200);
    expect(((await ok.json()) as { on: string }).on).toBe("2026-12-01");
    const bad = await getOverview(new Request(`${base}/api/overview?on=2026-02-30`), params());
    expect(bad.status).toBe(422);
    expect(JSON.stringify(await bad.json())).toContain("Enter a date as YYYY-MM-DD");
  });
});
