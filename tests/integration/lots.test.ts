import { eq } from "drizzle-orm";
import { beforeAll, beforeEach, describe, expect, it } from "vitest";
import { createLotAction, recordProcessingAction } from "@/app/(app)/lots/actions";
import { db } from "@/db/client";
import { exchangeRates, processingRecords } from "@/db/schema";
import { getLotDetail, listLots } from "@/lib/data/lots";
import { createTeam, signInAs, type TeamFixture } from "../support/fixtures";
import { createTestLot, newKey } from "../support/lots";
import { form } from "../support/matrix";
import { freshRequest } from "../support/request";

let team: TeamFixture;
beforeAll(async () => {
  team = await createTeam("lots");
});
beforeEach(async () => {
  freshRequest();
  await signInAs(team.people.owner.id, team.workspaceId);
});

const step = (lotId: string, o: Record<string, string>) =>
  recordProcessingAction(null, form({ lotId, performedOn: "2026-11-03", submissionKey: newKey(), ...o }));

describe("recording processing", () => {
  it("refuses a step whose mass out is more than its mass in, and saves nothing", async () => {
    const lot = await createTestLot(team.workspaceId);
    const r = await step(lot.id, { step: "roasting", massInKg: "50", massOutKg: "51", roastTemperatureC: "130", roastMinutes: "20" });
    expect(r).toMatchObject({ ok: false, code: "invalid", message: "Mass out (51 kg) is more than mass in (50 kg)." });
    expect(await db.select().from(processingRecords).where(eq(processingRecords.lotId, lot.id))).toEqual([]);
  });

  it("refuses winnowing parts that add up to more than the mass in", async () => {
    const lot = await createTestLot(team.workspaceId);
    const r = await step(lot.id, { step: "winnowing", massInKg: "90", massOutKg: "78", shellKg: "12", dustKg: "1" });
    expect(r).toMatchObject({ ok: false, message: "The parts recorded (91 kg) add up to more than the mass in (90 kg)." });
  });

  it("records a step once when the same form is submitted twice", async () => {
    const lot = await createTestLot(team.workspaceId);
    const fields = { lotId: lot.id, step: "sorting", performedOn: "2026-11-03", massInKg: "100", massOutKg: "97", rejectsKg: "3", submissionKey: newKey() };
    const [a, b] = await Promise.all([recordProcessingAction(null, form(fields)), recordProcessingAction(null, form(fields))]);
    expect([a, b].map((r) => r.ok)).toEqual([true, true]);
    const created = [a, b].map((r) => (r.ok ? r.data.created : null)).sort();
    expect(created).toEqual([false, true]);
    expect(await db.select().from(processingRecords).where(eq(processingRecords.lotId, lot.id))).toHaveLength(1);
  });

  it("requires temperature and time for a roast", async () => {
    const lot = await createTestLot(team.workspaceId);
    const r = await step(lot.id, { step: "roasting", massInKg: "50", massOutKg: "47.5" });
    expect(r).toMatchObject({ ok: false, fieldErrors: { roastTemperatureC: ["A roast needs its temperature and time."] } });
  });
});

describe("nib cost of a lot", () => {
  it("follows the recorded chain: (price + freight + processing) / nibs, in the base currency", async () => {
    const r = await createLotAction(
      null,
      form({ code: `C-${newKey()}`, originCountry: "Tanzania", arrivedOn: "2026-10-10", massReceivedKg: "100", pricePaid: "600", currency: "EUR", freight: "40" }),
    );
    expect(r.ok).toBe(true);
    const lotId = r.ok ? r.data.id : "";
    // Before any processing: 100 kg × 78 % (the workspace's estimate) = 78 kg; (600 + 40) / 78 = 8.2051… EUR/kg.
    let d = await getLotDetail({ workspaceId: team.workspaceId, lotId });
    expect(d.nibCost.estimated).toBe(true);
    expect(d.nibCost.perKg?.slice(0, 8)).toBe("8.205128");

    await step(lotId, { step: "sorting", massInKg: "100", massOutKg: "97", rejectsKg: "3" });
    await step(lotId, { step: "roasting", massInKg: "97", massOutKg: "92.15", roastTemperatureC: "132", roastMinutes: "20", cost: "10" });
    await step(lotId, { step: "winnowing", massInKg: "92.15", massOutKg: "80", shellKg: "11.15", dustKg: "1" });
    // Recorded: (600 + 40 + 10 roasting) / 80 kg nibs = 650 / 80 = 8.125 EUR/kg exactly.
    d = await getLotDetail({ workspaceId: team.workspaceId, lotId });
    expect(d.nibCost).toMatchObject({ perKg: "8.125", estimated: false });
    expect(d.chain.cumulativeYieldPercent).toBe("80");
    expect(d.chain.notices).toEqual([]);
  });

  it("converts a lot bought in another currency at the arrival date's rate, and says when a rate is missing", async () => {
    const lot = await createTestLot(team.workspaceId, { pricePaid: "1000", currency: "USD", arrivedOn: "2026-06-01" });
    let d = await getLotDetail({ workspaceId: team.workspaceId, lotId: lot.id });
    expect(d.nibCost).toMatchObject({ perKg: null, problem: "No USD → EUR exchange rate on or before 2026-06-01. Add one under Currencies." });
    await db.insert(exchangeRates).values([
      { workspaceId: team.workspaceId, currency: "USD", rateToBase: "0.9", validOn: "2026-05-01" },
      { workspaceId: team.workspaceId, currency: "USD", rateToBase: "0.5", validOn: "2026-07-01" }, // after arrival: not used
    ]);
    d = await getLotDetail({ workspaceId: team.workspaceId, lotId: lot.id });
    // 1000 USD × 0.9 = 900 EUR over 78 kg estimated nibs = 11.538461… EUR/kg.
    expect(d.nibCost.perKg?.slice(0, 9)).toBe("11.538461");
  });

  it("lists only the workspace's own lots", async () => {
    const other = await createTeam("lots-other");
    const theirs = await createTestLot(other.workspaceId);
    const ours = await listLots({ workspaceId: team.workspaceId });
    expect(ours.some((l) => l.id === theirs.id)).toBe(false);
  });

  it("refuses a duplicate lot code with a clear message", async () => {
    const lot = await createTestLot(team.workspaceId);
    const r = await createLotAction(
      null,
      form({ code: lot.code, originCountry: "Peru", arrivedOn: "2026-10-01", massReceivedKg: "10", pricePaid: "1", currency: "EUR" }),
    );
    expect(r).toMatchObject({ ok: false, code: "conflict", message: `A lot with the code ${lot.code} already exists.` });
  });

  it("explains bad lot input field by field", async () => {
    const r = await createLotAction(null, form({ code: "", originCountry: "P", arrivedOn: "2026-02-30", massReceivedKg: "-4", pricePaid: "abc", currency: "euro" }));
    expect(r.ok).toBe(false);
    const fe = (r as { fieldErrors: Record<string, string[]> }).fieldErrors;
    expect(Object.keys(fe).sort()).toEqual(["arrivedOn", "code", "currency", "massReceivedKg", "originCountry", "pricePaid"]);
  });
});
