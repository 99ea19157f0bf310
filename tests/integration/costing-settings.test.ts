/**
 * Cost settings (insert-only revisions, no silent overwrite, base currency),
 * who may see costs (the owner's workspace setting), and the comparison CSV.
 */
import { sql } from "drizzle-orm";
import { beforeEach, describe, expect, it } from "vitest";
import { GET as getComparison } from "@/app/api/costing/[recipeId]/comparison/route";
import { saveCostSettingsAction, setCostVisibilityAction } from "@/app/(app)/costing/actions";
import { db } from "@/db/client";
import { canSeeCosts } from "@/lib/auth/costs";
import { setShowCostsToAll } from "@/lib/data/cost-visibility";
import { getCostSettings, listCostSettings, saveCostSettings } from "@/lib/data/cost-settings";
import { loadRecipeCosting } from "@/lib/data/costing";
import { releaseVersion } from "@/lib/data/recipes-releases";
import { deleteExchangeRate, listExchangeRates, setBaseCurrency } from "@/lib/data/exchange-rates";
import { costedRecipe, makeLeadSupplier, parseSettings, settingsForm } from "../support/costing";
import { createTeam, signInAs, type TeamFixture } from "../support/fixtures";
import { makeQuote } from "../support/ingredients";
import { base, params } from "../support/matrix";
import { freshRequest } from "../support/request";

let team: TeamFixture;
let fx: Awaited<ReturnType<typeof costedRecipe>>;
beforeEach(async () => {
  freshRequest();
  team = await createTeam("costset");
  fx = await costedRecipe(team);
});

const save = (over: Record<string, string>) =>
  saveCostSettings({ workspaceId: team.workspaceId, userId: team.people.buyer.id, currency: "EUR", input: parseSettings(fx.recipeId, over) });

describe("cost settings", () => {
  it("start as ingredients only, then keep every revision", async () => {
    expect(await getCostSettings({ workspaceId: team.workspaceId, recipeId: fx.recipeId })).toMatchObject({ revision: 0, currency: null, settings: { packagingPerBar: "0", barsPerCase: 1 } });
    await save({ packagingPerBar: "0.32", barsPerCase: "12" });
    await save({ expectedRevision: "1", packagingPerBar: "0.35", barsPerCase: "12", note: "New wrapper printer" });
    const history = await listCostSettings({ workspaceId: team.workspaceId, recipeId: fx.recipeId });
    expect(history.map((h) => [h.revision, h.settings.packagingPerBar, h.note])).toEqual([
      [2, "0.35", "New wrapper printer"],
      [1, "0.32", null],
    ]);
  });

  it("refuses a save made from an old revision, naming the new one", async () => {
    await save({ packagingPerBar: "0.32" });
    await expect(save({ packagingPerBar: "0.40" })).rejects.toMatchObject({ code: "conflict", message: expect.stringContaining("now revision 1") });
  });

  it("are insert-only in the database itself", async () => {
    await save({ packagingPerBar: "0.32" });
    await expect(db.execute(sql`update recipe_cost_settings set packaging_per_bar = 0 where recipe_id = ${fx.recipeId}`)).rejects.toThrow();
  });

  it("cost the bar with the loss, labour, overhead and packaging", async () => {
    await save({ processLossPercent: "4", labourPerKg: "3.5", overheadPerBar: "0.05", packagingPerBar: "0.3", barsPerCase: "12", wholesalePricePerBar: "2.4" });
    const { report } = await loadRecipeCosting({ workspaceId: team.workspaceId, recipeId: fx.recipeId, on: "2026-03-01" });
    // Ingredients 12.15522126/kg (costing-suppliers.test.ts); ÷ 0.96 = 12.66168881250…/kg finished.
    // 70 g: 0.07 × 12.6616888125 = 0.886318216875; + labour 0.245 + overhead 0.05 + packaging 0.3 = 1.481318216875 → EUR 1.48.
    const { cost, margins } = report.scenarios.preferred;
    expect(cost).toMatchObject({ ok: true, costPerKgFinished: "12.6616888125", costPerBar: "1.481318216875", costPerCase: "17.7758186025" });
    // (2.40 − 1.481318216875) ÷ 2.40 = 38.2784076302083… %.
    expect(margins?.wholesaleMargin).toMatchObject({ ok: true, value: expect.stringMatching(/^38\.278407630208/) });
  });

  it("are set aside, with a message, when the base currency has changed since", async () => {
    await save({ packagingPerBar: "0.32" });
    for (const rate of await listExchangeRates({ workspaceId: team.workspaceId })) await deleteExchangeRate({ workspaceId: team.workspaceId, rateId: rate.id });
    await setBaseCurrency({ workspaceId: team.workspaceId, baseCurrency: "GBP" });
    const costing = await loadRecipeCosting({ workspaceId: team.workspaceId, recipeId: fx.recipeId, on: "2026-03-01" });
    expect(costing.currencyProblem).toMatch(/entered in EUR, but the base currency is now GBP/);
    expect(costing.settings.packagingPerBar).toBe("0");
  });

  it("come back as field messages for bad input, through the action", async () => {
    await signInAs(team.people.buyer.id, team.workspaceId);
    const result = await saveCostSettingsAction(settingsForm(fx.recipeId, { processLossPercent: "100", barsPerCase: "2.5", packagingPerBar: "abc" }));
    expect(result).toMatchObject({ ok: false, code: "invalid" });
    const errors = !result.ok ? result.fieldErrors ?? {} : {};
    expect(errors.processLossPercent?.[0]).toBe("The process loss must be at most 99.99.");
    expect(errors.barsPerCase?.[0]).toBe("Bars per case must be a whole number from 1 to 10000.");
    expect(errors.packagingPerBar?.[0]).toMatch(/^Enter packaging per bar as a number/);
  });
});

const csv = () => getComparison(new Request(`${base}/api/costing/${fx.recipeId}/comparison`), params({ recipeId: fx.recipeId }));

describe("who sees costs", () => {
  it("keeps production and viewers out until the owner allows them", async () => {
    await signInAs(team.people.production.id, team.workspaceId);
    expect((await csv()).status).toBe(403);
    // Production reads released versions only, costs included.
    await releaseVersion({ workspaceId: team.workspaceId, userId: team.people.formulator.id, recipeId: fx.recipeId, versionNo: 1 });
    freshRequest();
    await signInAs(team.people.owner.id, team.workspaceId);
    expect(await setCostVisibilityAction({ show: "on" })).toMatchObject({ ok: true, data: { show: true } });
    for (const role of ["production", "viewer"] as const) {
      freshRequest();
      await signInAs(team.people[role].id, team.workspaceId);
      expect((await csv()).status).toBe(200);
      expect(await canSeeCosts({ user: { id: team.people[role].id, email: "", name: "" }, workspace: { id: team.workspaceId, name: "" }, role })).toBe(true);
    }
    freshRequest();
    await signInAs(team.people.owner.id, team.workspaceId);
    await setCostVisibilityAction({ show: false });
    freshRequest();
    await signInAs(team.people.viewer.id, team.workspaceId);
    expect((await csv()).status).toBe(403);
  });

  it("shows production only released versions once costs are shared", async () => {
    await setShowCostsToAll({ workspaceId: team.workspaceId, show: true });
    await signInAs(team.people.production.id, team.workspaceId);
    expect((await csv()).status).toBe(404);
  });

  it("lets only the owner change the setting", async () => {
    await signInAs(team.people.buyer.id, team.workspaceId);
    expect(await setCostVisibilityAction({ show: true })).toMatchObject({ ok: false, code: "forbidden" });
  });
});

describe("the comparison CSV", () => {
  it("lists each source's price and neutralises a name a spreadsheet would run as a formula", async () => {
    const evil = await makeLeadSupplier(team.workspaceId, "=HYPERLINK(\"http://x.example\")", "EUR", 3);
    await makeQuote(team.workspaceId, team.people.buyer.id, { supplierId: evil.id, ingredientId: fx.ids.sugar, price: "0.99", validFrom: "2020-01-01" });
    await signInAs(team.people.buyer.id, team.workspaceId);
    const res = await csv();
    expect(res.status).toBe(200);
    expect(res.headers.get("content-type")).toBe("text/csv; charset=utf-8");
    const text = await res.text();
    const [header, ...lines] = text.replace(/^\uFEFF/, "").split("\r\n");
    expect(header).toContain(`"'=HYPERLINK(""http://x.example"") `);
    const sugar = lines.find((l) => l.startsWith('"Sugar (sucrose)"'))!;
    // The cheapest sugar is the 0.99 EUR/kg quote, named with its leading quote mark.
    expect(sugar).toContain('"0.9900"');
    expect(sugar).toContain(`"'=HYPERLINK(""http://x.example"") `);
    expect(text).toContain('"Chosen combination"');
  });
});
