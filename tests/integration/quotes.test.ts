import { beforeEach, describe, expect, it } from "vitest";
import { setPreferredSupplier } from "@/lib/data/ingredients";
import { getCurrentPrices } from "@/lib/data/prices";
import { listQuotes } from "@/lib/data/quotes";
import { createTeam, type TeamFixture } from "../support/fixtures";
import { addRate, makeIngredient, makeQuote, makeSupplier } from "../support/ingredients";

let team: TeamFixture;
beforeEach(async () => {
  team = await createTeam("quotes");
});

describe("quote history", () => {
  it("keeps every quote: a new price is a new row, the old one stays", async () => {
    const ws = team.workspaceId;
    const supplier = await makeSupplier(ws);
    const sugar = await makeIngredient(ws);
    await makeQuote(ws, team.people.buyer.id, { supplierId: supplier.id, ingredientId: sugar.id, price: "0.92", validFrom: "2026-01-10" });
    await makeQuote(ws, team.people.buyer.id, { supplierId: supplier.id, ingredientId: sugar.id, price: "0.96", validFrom: "2026-06-10" });
    const { quotes } = await listQuotes({ workspaceId: ws, ingredientId: sugar.id, on: "2026-07-01" });
    expect(quotes.map((q) => [q.price, q.current])).toEqual([
      ["0.96", true],
      ["0.92", false],
    ]);
    // On a day between the two, the older one is the current one.
    const earlier = await listQuotes({ workspaceId: ws, ingredientId: sugar.id, on: "2026-03-01" });
    expect(earlier.quotes.find((q) => q.current)?.price).toBe("0.92");
  });

  it("refuses the exact same quote twice", async () => {
    const ws = team.workspaceId;
    const supplier = await makeSupplier(ws);
    const sugar = await makeIngredient(ws);
    const q = { supplierId: supplier.id, ingredientId: sugar.id, price: "1.50" };
    await makeQuote(ws, team.people.buyer.id, q);
    await expect(makeQuote(ws, team.people.buyer.id, { ...q, price: "1.5" })).rejects.toMatchObject({ code: "conflict" });
  });

  it("never lists another workspace's quotes", async () => {
    const other = await createTeam("quotes-other");
    const supplier = await makeSupplier(other.workspaceId);
    const sugar = await makeIngredient(other.workspaceId);
    await makeQuote(other.workspaceId, other.people.buyer.id, { supplierId: supplier.id, ingredientId: sugar.id, price: "1" });
    expect((await listQuotes({ workspaceId: team.workspaceId, on: "2026-07-01" })).quotes).toEqual([]);
  });
});

describe("getCurrentPrices", () => {
  it("picks the preferred supplier's valid quote on the day, converted to the base currency", async () => {
    const ws = team.workspaceId;
    const greyfriars = await makeSupplier(ws);
    const other = await makeSupplier(ws);
    const liquor = await makeIngredient(ws, { kind: "cocoa_liquor", sugar: "0", cocoaButter: "52.31", cocoaSolidsNonFat: "46.35", moisture: "1.34" });
    const buyer = team.people.buyer.id;
    await makeQuote(ws, buyer, { supplierId: greyfriars.id, ingredientId: liquor.id, price: "342", currency: "USD", unit: "per_pack", packKg: "25", validFrom: "2026-03-01" });
    await makeQuote(ws, buyer, { supplierId: greyfriars.id, ingredientId: liquor.id, price: "365", currency: "USD", unit: "per_pack", packKg: "25", validFrom: "2026-09-01", validUntil: "2026-11-30" });
    // Cheaper, but not the preferred supplier: ignored.
    await makeQuote(ws, buyer, { supplierId: other.id, ingredientId: liquor.id, price: "1", validFrom: "2026-01-01" });
    await addRate(ws, "USD", "0.938", "2026-01-05");
    await addRate(ws, "USD", "0.92", "2026-10-01");
    await setPreferredSupplier({ workspaceId: ws, ingredientId: liquor.id, supplierId: greyfriars.id });

    const at = async (on: string) => (await getCurrentPrices({ workspaceId: ws, ingredientIds: [liquor.id], on }))[liquor.id];
    // 342 / 25 = 13.68 USD/kg × 0.938 = 12.83184 EUR/kg.
    expect(await at("2026-05-01")).toMatchObject({ status: "priced", pricePerKg: "12.83184", baseCurrency: "EUR", rate: { validOn: "2026-01-05" } });
    // 365 / 25 = 14.6 × 0.938 (before the October rate).
    expect(await at("2026-09-15")).toMatchObject({ status: "priced", pricePerKg: "13.6948" });
    // × 0.92 from 1 October.
    expect(await at("2026-10-15")).toMatchObject({ status: "priced", pricePerKg: "13.432", quoted: { price: "365", currency: "USD", unit: "per_pack" } });
    // The September quote has expired: the March one is current again.
    expect(await at("2026-12-01")).toMatchObject({ status: "priced", pricePerKg: "12.5856" });
    expect(await at("2026-02-01")).toMatchObject({ status: "missing", reason: "no_valid_quote" });
  });

  it("explains each missing price", async () => {
    const ws = team.workspaceId;
    const supplier = await makeSupplier(ws, { currency: "GBP" });
    const lonely = await makeIngredient(ws);
    const noRate = await makeIngredient(ws);
    await makeQuote(ws, team.people.buyer.id, { supplierId: supplier.id, ingredientId: noRate.id, price: "6.8", currency: "GBP" });
    await setPreferredSupplier({ workspaceId: ws, ingredientId: noRate.id, supplierId: supplier.id });
    const foreign = await makeIngredient((await createTeam("prices-x")).workspaceId);
    const prices = await getCurrentPrices({ workspaceId: ws, ingredientIds: [lonely.id, noRate.id, foreign.id], on: "2026-06-01" });
    expect(prices[lonely.id]).toMatchObject({ status: "missing", reason: "no_preferred_supplier" });
    expect(prices[noRate.id]).toMatchObject({ status: "missing", reason: "no_exchange_rate" });
    expect(prices[noRate.id]?.status === "missing" && prices[noRate.id]).toMatchObject({ message: expect.stringMatching(/No GBP → EUR exchange rate/) });
    // Another workspace's ingredient is never priced here.
    expect(prices[foreign.id]).toMatchObject({ status: "missing", reason: "unknown_ingredient" });
  });
});
