import { and, eq } from "drizzle-orm";
import { beforeAll, beforeEach, describe, expect, it } from "vitest";
import { GET as getBatches } from "@/app/api/batches/route";
import { GET as getBatchRoute } from "@/app/api/batches/[batchId]/route";
import { db } from "@/db/client";
import { stockMovements } from "@/db/schema";
import { lineDeviation, sumGrams } from "@/lib/batches/deviation";
import { AppError } from "@/lib/errors";
import { cancelBatch, getBatch } from "@/lib/data/batches";
import { scalePlan } from "@/lib/data/batches-plan";
import { createStation } from "@/lib/data/machines";
import { getLotNibStock } from "@/lib/data/nib-stock";
import { createRecipe } from "@/lib/data/recipes-create";
import { recordRun } from "@/lib/data/runs";
import { batchesUsingLot, lotsOfBatch } from "@/lib/data/traceability";
import { previewBatchSchema, recordRunSchema } from "@/lib/validation/batches";
import { lotWithNibs, planTestBatch, productionSetup } from "../support/batches";
import { createTestLot } from "../support/lots";
import { createTeam, signInAs, type TeamFixture } from "../support/fixtures";
import { base, params } from "../support/matrix";
import { uniqueName } from "../support/recipe-fixtures";
import { freshRequest } from "../support/request";

let team: TeamFixture;
let setup: Awaited<ReturnType<typeof productionSetup>>;

beforeAll(async () => {
  team = await createTeam("batches");
  setup = await productionSetup(team);
});
beforeEach(() => freshRequest());

async function failure(promise: Promise<unknown>): Promise<AppError> {
  const err = await promise.then(
    () => null,
    (e: unknown) => e,
  );
  if (!(err instanceof AppError)) throw new Error(`expected an AppError, got ${String(err)}`);
  return err;
}

/** A run that weighs every line as planned, nibs from `lotCode`, sugar from a supplier lot. */
async function runAsPlanned(batchId: string, lotCode: string, change: (ingredientKind: string, grams: string) => string = (_k, g) => g) {
  const batch = await getBatch({ workspaceId: team.workspaceId, batchId });
  const portions = batch.lines.map((l) => ({
    batchLineId: l.id,
    actual: change(l.ingredientKind, l.massGrams),
    unit: "g",
    lotCode: l.ingredientKind === "nibs" ? lotCode : l.ingredientKind === "sugar" ? "SSC-2611-B" : "",
  }));
  const input = recordRunSchema.parse({ batchId, startedAt: "2026-12-03T08:00", endedAt: "2026-12-04T16:00", tolerancePercent: "1", portions });
  return recordRun({ workspaceId: team.workspaceId, userId: team.people.production.id, input });
}

describe("planning a batch", () => {
  it("stores the engine's masses: 25 kg on a 10 kg refiner is three loads that add up exactly", async () => {
    const { id, code } = await planTestBatch(team, setup);
    expect(code).toMatch(/^B-\d{4}-\d{4}$/);
    const batch = await getBatch({ workspaceId: team.workspaceId, batchId: id });
    expect(batch.status).toBe("planned");
    expect(batch.versionNo).toBe(1);
    expect(batch.totalMassGrams).toBe("25000");
    expect(batch.lines.map((l) => [l.ingredientKind, l.massGrams])).toEqual([
      ["nibs", "16000"], // 64 % of 25 kg
      ["cocoa_butter", "1825"],
      ["sugar", "7100"],
      ["lecithin", "75"],
    ]);
    expect(batch.loads.map((l) => l.massGrams)).toEqual(["8334", "8333", "8333"]);
    expect(batch.lines.find((l) => l.ingredientKind === "lecithin")!.allergens).toEqual(["soybeans"]);
  });

  it("gives each batch the next code of the year", async () => {
    const a = await planTestBatch(team, setup);
    const b = await planTestBatch(team, setup);
    expect(Number(b.code.slice(-4))).toBe(Number(a.code.slice(-4)) + 1);
  });

  it("turns bars into mass and warns where a coarse scale distorts a line", async () => {
    const bars = await scalePlan({ workspaceId: team.workspaceId, input: previewBatchSchema.parse({ recipeId: setup.recipeId, amount: "1000", unit: "bars", stationId: setup.stationId }) });
    expect(bars.totalMassGrams).toBe("70000"); // 1,000 bars × 70 g
    expect(bars.loads).toHaveLength(1);
    const floor = await createStation({ workspaceId: team.workspaceId, name: uniqueName("Floor scale"), resolutionGrams: "100", capacityKg: "150" });
    const small = await scalePlan({ workspaceId: team.workspaceId, input: previewBatchSchema.parse({ recipeId: setup.recipeId, amount: "1", unit: "kg", stationId: floor.id }) });
    expect(small.notes).toContain("Soy lecithin rounds to 0 g at a 100 g step (exactly 3 g). Weigh it on a finer scale.");
  });

  it("refuses a recipe that has no released version", async () => {
    const { recipeId } = await createRecipe({
      workspaceId: team.workspaceId,
      userId: team.people.formulator.id,
      input: { name: uniqueName("Unreleased"), chocolateType: "dark", barMassGrams: "70", notes: undefined, start: "starting_point", startingPointKey: "classic-dark-70", targetCocoaPercent: "70" },
    });
    const err = await failure(planTestBatch(team, { ...setup, recipeId }));
    expect(err.code).toBe("invalid");
    expect(err.fieldErrors?.recipeId?.[0]).toMatch(/no released version/);
  });
});

describe("recording a run", () => {
  it("completes the batch, takes the nibs off the lot and flags lines beyond the tolerance", async () => {
    const lot = await lotWithNibs(team.workspaceId, "80");
    const { id } = await planTestBatch(team, setup);
    // Sugar 2 % over plan (7,242 g instead of 7,100 g) against a 1 % tolerance.
    await runAsPlanned(id, lot.code, (kind, g) => (kind === "sugar" ? "7242" : g));
    const batch = await getBatch({ workspaceId: team.workspaceId, batchId: id });
    expect(batch.status).toBe("completed");
    expect(batch.run?.portions).toHaveLength(4);
    expect(await getLotNibStock({ workspaceId: team.workspaceId, lotId: lot.id })).toMatchObject({ producedKg: "80", usedKg: "16", inStockKg: "64" });
    const used = await db.select().from(stockMovements).where(and(eq(stockMovements.workspaceId, team.workspaceId), eq(stockMovements.runId, batch.run!.id)));
    // Butter, sugar and lecithin come off the ingredient ledger; the nibs came from the lot.
    expect(used.map((m) => m.massKg).sort()).toEqual(["-0.075", "-1.825", "-7.242"]);
    const flagged = batch.lines.filter((l) => {
      const actual = sumGrams(batch.run!.portions.filter((p) => p.batchLineId === l.id).map((p) => p.actualGrams));
      return lineDeviation({ plannedGrams: l.massGrams, actualGrams: actual, tolerancePercent: batch.run!.tolerancePercent, resolutionGrams: batch.resolutionGrams }).flagged;
    });
    expect(flagged.map((l) => l.ingredientKind)).toEqual(["sugar"]);
  });

  it("refuses more nibs than the lot has, nibs without a bean lot, and a second run", async () => {
    const lot = await lotWithNibs(team.workspaceId, "20");
    const a = await planTestBatch(team, setup);
    const b = await planTestBatch(team, setup);
    await runAsPlanned(a.id, lot.code); // 16 kg of 20
    const over = await failure(runAsPlanned(b.id, lot.code));
    expect(over.code).toBe("invalid");
    expect(Object.values(over.fieldErrors ?? {}).flat()).toContain(`${lot.code} has 4.000 kg of nibs in stock; this run takes 16.000 kg.`);
    const noLot = await failure(runAsPlanned(b.id, "NOT-A-LOT"));
    expect(Object.values(noLot.fieldErrors ?? {}).flat()).toContain("NOT-A-LOT is not one of your bean lots.");
    expect((await getBatch({ workspaceId: team.workspaceId, batchId: b.id })).status).toBe("planned"); // nothing written
    const again = await failure(runAsPlanned(a.id, lot.code));
    expect(again.code).toBe("conflict");
  });

  it("refuses nibs from a lot that is not winnowed yet, and a cancelled batch", async () => {
    const raw = await createTestLot(team.workspaceId);
    const batch = await planTestBatch(team, setup);
    const err = await failure(runAsPlanned(batch.id, raw.code));
    expect(Object.values(err.fieldErrors ?? {}).flat()).toContain(`${raw.code} has no nibs yet (winnowing is not recorded); this run takes 16.000 kg.`);
    await cancelBatch({ workspaceId: team.workspaceId, batchId: batch.id });
    expect((await failure(runAsPlanned(batch.id, raw.code))).code).toBe("conflict");
  });
});

describe("traceability", () => {
  it("answers batch → lots and lot → batches, and through the API", async () => {
    const lotA = await lotWithNibs(team.workspaceId, "100");
    const lotB = await lotWithNibs(team.workspaceId, "100");
    const first = await planTestBatch(team, setup);
    const second = await planTestBatch(team, setup);
    const other = await planTestBatch(team, setup);
    await runAsPlanned(first.id, lotA.code);
    // The second batch splits its nibs across both lots: 10 kg from A, 6 kg from B.
    const batch = await getBatch({ workspaceId: team.workspaceId, batchId: second.id });
    const nibs = batch.lines.find((l) => l.ingredientKind === "nibs")!;
    const portions = batch.lines.flatMap((l) =>
      l.id === nibs.id
        ? [
            { batchLineId: l.id, actual: "10", unit: "kg", lotCode: lotA.code.toLowerCase() },
            { batchLineId: l.id, actual: "6", unit: "kg", lotCode: lotB.code },
          ]
        : [{ batchLineId: l.id, actual: l.massGrams, unit: "g", lotCode: "" }],
    );
    await recordRun({
      workspaceId: team.workspaceId,
      userId: team.people.production.id,
      input: recordRunSchema.parse({ batchId: second.id, startedAt: "2026-12-05T08:00", endedAt: "2026-12-06T12:00", tolerancePercent: "1", portions }),
    });
    await runAsPlanned(other.id, lotB.code);

    expect(await lotsOfBatch({ workspaceId: team.workspaceId, batchId: first.id })).toEqual([
      { lotId: lotA.id, code: lotA.code, ingredientName: "Cocoa nibs (roasted)", grams: "16000", consumesNibs: true },
      { lotId: null, code: "SSC-2611-B", ingredientName: "Sugar (sucrose)", grams: "7100", consumesNibs: false },
    ]);
    const recallA = await batchesUsingLot({ workspaceId: team.workspaceId, lotId: lotA.id });
    expect(recallA.map((r) => [r.code, r.grams])).toEqual([
      [second.code, "10000"],
      [first.code, "16000"],
    ]);
    const recallB = await batchesUsingLot({ workspaceId: team.workspaceId, lotId: lotB.id });
    expect(recallB.map((r) => r.code).sort()).toEqual([other.code, second.code].sort());
    expect(await getLotNibStock({ workspaceId: team.workspaceId, lotId: lotB.id })).toMatchObject({ usedKg: "22", inStockKg: "78" });

    await signInAs(team.people.viewer.id, team.workspaceId);
    const res = await getBatches(new Request(`${base}/api/batches?lotId=${lotA.id}`), params());
    expect(res.status).toBe(200);
    const body = (await res.json()) as { lot: { code: string }; batches: { code: string }[] };
    expect(body.lot.code).toBe(lotA.code);
    expect(body.batches.map((b) => b.code)).toEqual([second.code, first.code]);
    const detail = await getBatchRoute(new Request(`${base}/api/batches/${second.id}`), params({ batchId: second.id }));
    const { lots } = (await detail.json()) as { lots: { code: string; grams: string }[] };
    expect(lots.filter((l) => l.code === lotA.code || l.code === lotB.code).map((l) => l.grams)).toEqual(["10000", "6000"]);
  });

  it("never shows another workspace's lot or batch", async () => {
    const other = await createTeam("batches-other");
    const lot = await lotWithNibs(team.workspaceId, "50");
    expect(await batchesUsingLot({ workspaceId: other.workspaceId, lotId: lot.id })).toEqual([]);
    await signInAs(other.people.owner.id, other.workspaceId);
    expect((await getBatches(new Request(`${base}/api/batches?lotId=${lot.id}`), params())).status).toBe(404);
  });
});
