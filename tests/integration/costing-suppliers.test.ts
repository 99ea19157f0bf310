/**
 * Supplier selection as quotes start and expire: which source prices each
 * ingredient in the preferred, cheapest and chosen combinations, on a given
 * day. Prices and rates are invented demo data; figures are worked by hand.
 */
import { beforeEach, describe, expect, it } from "vitest";
import { savePick } from "@/lib/data/cost-picks";
import { loadRecipeCosting } from "@/lib/data/costing";
import { setPreferredSupplier } from "@/lib/data/ingredients";
import { createTeam, type TeamFixture } from "../support/fixtures";
import { costedRecipe } from "../support/costing";
import { makeQuote } from "../support/ingredients";
import { createTestLot } from "../support/lots";

let team: TeamFixture;
let fx: Awaited<ReturnType<typeof costedRecipe>>;
beforeEach(async () => {
  team = await createTeam("costing");
  fx = await costedRecipe(team);
});

const load = (on: string) => loadRecipeCosting({ workspaceId: team.workspaceId, recipeId: fx.recipeId, on });
const perBar = (c: { ok: boolean; costPerBar?: string }) => (c.ok ? c.costPerBar : null);
const sugarRow = (costing: Awaited<ReturnType<typeof load>>) => costing.report.rows.find((r) => r.ingredientId === fx.ids.sugar)!;

describe("supplier selection while quotes are valid", () => {
  it("costs the preferred suppliers, converting the sugar quote from GBP", async () => {
    const costing = await load("2026-03-01");
    // Sugar: 985 GBP/t = 0.985 GBP/kg × 1.149 = 1.131765 EUR/kg.
    expect(sugarRow(costing).cells[`supplier:${fx.suppliers.sugarCo.id}`]!.option.perKg).toBe("1.131765");
    // 0.64 × 16.2 + 0.073 × 19.8 + 0.284 × 1.131765 + 0.003 × 6.8 = 10.368 + 1.4454 + 0.32142126 + 0.0204
    // = 12.15522126 EUR/kg; a 70 g bar: 0.8508654882 → EUR 0.85.
    const { preferred, cheapest, chosen } = costing.report.scenarios;
    expect(preferred.cost).toMatchObject({ ok: true, ingredientCostPerKg: "12.15522126", costPerBar: "0.8508654882" });
    // The GBP sugar is also the cheapest, and no pick means the preferred supplier.
    expect(perBar(cheapest.cost)).toBe("0.8508654882");
    expect(perBar(chosen.cost)).toBe("0.8508654882");
    expect(sugarRow(costing).cheapestKey).toBe(`supplier:${fx.suppliers.sugarCo.id}`);
  });
});

describe("supplier selection after a quote expires", () => {
  it("drops the expired quote: the preferred combination lacks sugar, the cheapest moves to the other supplier", async () => {
    const costing = await load("2026-08-01");
    const row = sugarRow(costing);
    expect(Object.keys(row.cells)).toEqual([`supplier:${fx.suppliers.fine.id}`]);
    const { preferred, cheapest, chosen } = costing.report.scenarios;
    expect(preferred.cost).toMatchObject({ ok: false, missingPriceLines: [2] });
    expect(preferred.choices[2]!.note).toBe(`No quote from ${fx.suppliers.sugarCo.name} for Sugar (sucrose) is valid on 2026-08-01.`);
    // Cheapest: sugar at 1.30 EUR/kg; 0.284 × 1.3 = 0.3692; per kg 10.368 + 1.4454 + 0.3692 + 0.0204 = 12.203;
    // 70 g → 0.85421 → EUR 0.85.
    expect(cheapest.cost).toMatchObject({ ok: true, ingredientCostPerKg: "12.203", costPerBar: "0.85421" });
    expect(chosen.cost.ok).toBe(false);
  });

  it("uses the buyer's pick of the other supplier in the chosen combination", async () => {
    await savePick({ workspaceId: team.workspaceId, userId: team.people.buyer.id, recipeId: fx.recipeId, ingredientId: fx.ids.sugar, source: `supplier:${fx.suppliers.fine.id}` });
    const costing = await load("2026-08-01");
    expect(perBar(costing.report.scenarios.chosen.cost)).toBe("0.85421");
    expect(sugarRow(costing).chosenKey).toBe(`supplier:${fx.suppliers.fine.id}`);
  });

  it("falls back to the preferred supplier when the picked supplier's quote has expired, and says so", async () => {
    await setPreferredSupplier({ workspaceId: team.workspaceId, ingredientId: fx.ids.sugar, supplierId: fx.suppliers.fine.id });
    await savePick({ workspaceId: team.workspaceId, userId: team.people.buyer.id, recipeId: fx.recipeId, ingredientId: fx.ids.sugar, source: `supplier:${fx.suppliers.sugarCo.id}` });
    expect(perBar((await load("2026-03-01")).report.scenarios.chosen.cost)).toBe("0.8508654882");
    const later = (await load("2026-08-01")).report.scenarios.chosen;
    expect(perBar(later.cost)).toBe("0.85421");
    expect(later.choices[2]!.note).toBe(
      `Your pick for Sugar (sucrose) (${fx.suppliers.sugarCo.name}) has no valid price on 2026-08-01; the preferred supplier is used.`,
    );
  });

  it("takes a renewed quote from the day it starts, and ignores one that has not started yet", async () => {
    const { sugarCo } = fx.suppliers;
    await makeQuote(team.workspaceId, team.people.buyer.id, { supplierId: sugarCo.id, ingredientId: fx.ids.sugar, price: "960", currency: "GBP", unit: "per_tonne", validFrom: "2026-07-01" });
    await makeQuote(team.workspaceId, team.people.buyer.id, { supplierId: sugarCo.id, ingredientId: fx.ids.sugar, price: "1010", currency: "GBP", unit: "per_tonne", validFrom: "2026-12-15" });
    // From 1 July: 0.96 × 1.149 = 1.10304 EUR/kg; 0.284 × 1.10304 = 0.31326336; per kg 12.14706336; 70 g → 0.8502944352.
    const costing = await load("2026-08-01");
    expect(sugarRow(costing).cells[`supplier:${sugarCo.id}`]!.option.perKg).toBe("1.10304");
    expect(costing.report.scenarios.preferred.cost).toMatchObject({ ok: true, costPerBar: "0.8502944352" });
    // On 1 December the 15 December quote is not in force yet.
    expect(sugarRow(await load("2026-12-01")).cells[`supplier:${sugarCo.id}`]!.option.perKg).toBe("1.10304");
  });
});

describe("bean lots as a source of nibs", () => {
  it("offers each lot's nib cost for the nibs line only, and prices the pick with it", async () => {
    // Invented lot: 100 kg of beans for EUR 500, nibs estimated at 78 kg → 500 ÷ 78 = 6.41025641… EUR/kg.
    const lot = await createTestLot(team.workspaceId);
    const costing = await load("2026-03-01");
    const nibs = costing.report.rows.find((r) => r.ingredientId === fx.ids.nibs)!;
    const cell = nibs.cells[`lot:${lot.id}`]!;
    expect(cell.option.perKg).toMatch(/^6\.41025641/);
    expect(cell.option.estimated).toBe(true);
    expect(nibs.cheapestKey).toBe(`lot:${lot.id}`);
    expect(sugarRow(costing).cells[`lot:${lot.id}`]).toBeUndefined();
    await expect(
      savePick({ workspaceId: team.workspaceId, userId: team.people.buyer.id, recipeId: fx.recipeId, ingredientId: fx.ids.sugar, source: `lot:${lot.id}` }),
    ).rejects.toMatchObject({ code: "invalid" });
    await savePick({ workspaceId: team.workspaceId, userId: team.people.buyer.id, recipeId: fx.recipeId, ingredientId: fx.ids.nibs, source: `lot:${lot.id}` });
    const chosen = (await load("2026-03-01")).report.scenarios.chosen;
    expect(chosen.choices[0]).toMatchObject({ key: `lot:${lot.id}`, perKg: cell.option.perKg });
  });
});

describe("picks", () => {
  it("refuses a supplier that never quoted the ingredient, and another workspace's supplier", async () => {
    const pick = (source: string) => savePick({ workspaceId: team.workspaceId, userId: team.people.buyer.id, recipeId: fx.recipeId, ingredientId: fx.ids.butter, source });
    await expect(pick(`supplier:${fx.suppliers.sugarCo.id}`)).rejects.toMatchObject({ code: "invalid" });
    const other = await createTeam("costing-other");
    const theirs = await costedRecipe(other);
    await expect(pick(`supplier:${theirs.suppliers.beans.id}`)).rejects.toMatchObject({ code: "not_found" });
  });

  it("forgets a pick with 'preferred'", async () => {
    const args = { workspaceId: team.workspaceId, userId: team.people.buyer.id, recipeId: fx.recipeId, ingredientId: fx.ids.sugar };
    await savePick({ ...args, source: `supplier:${fx.suppliers.fine.id}` });
    await savePick({ ...args, source: "preferred" });
    expect(sugarRow(await load("2026-03-01")).chosenKey).toBe(`supplier:${fx.suppliers.sugarCo.id}`);
  });
});
