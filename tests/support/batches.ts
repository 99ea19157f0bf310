/**
 * Production fixtures for integration tests, made through the app's own data
 * functions: a released 70 % dark recipe, a 10 kg stone refiner, a 1 g bench
 * scale and a bean lot with winnowing recorded (so its nibs exist).
 */
import { randomBytes } from "node:crypto";
import { db } from "@/db/client";
import { processingRecords } from "@/db/schema";
import { planBatch } from "@/lib/data/batches-plan";
import { createMachine, createStation } from "@/lib/data/machines";
import { releaseVersion } from "@/lib/data/recipes-releases";
import { planBatchSchema } from "@/lib/validation/batches";
import { createTestLot } from "./lots";
import { darkRecipe } from "./recipe-fixtures";

const key = () => randomBytes(3).toString("hex");

type Team = { workspaceId: string; people: { formulator: { id: string }; production: { id: string } } };

/** A released classic dark (nibs 64, cocoa butter 7.3, sugar 28.4, lecithin 0.3), a machine and a scale. */
export async function productionSetup(team: Team) {
  const recipeId = await darkRecipe(team);
  await releaseVersion({ workspaceId: team.workspaceId, userId: team.people.formulator.id, recipeId, versionNo: 1 });
  const refiner = await createMachine({ workspaceId: team.workspaceId, name: `Stone refiner ${key()}`, kind: "refiner", capacityKg: "10" });
  const bench = await createStation({ workspaceId: team.workspaceId, name: `Bench scale ${key()}`, resolutionGrams: "1", capacityKg: "15" });
  return { recipeId, machineId: refiner.id, stationId: bench.id };
}

/** A lot of `nibsKg` of recorded nibs (winnowing recorded). */
export async function lotWithNibs(workspaceId: string, nibsKg: string) {
  const lot = await createTestLot(workspaceId);
  await db.insert(processingRecords).values({
    workspaceId,
    lotId: lot.id,
    step: "winnowing",
    performedOn: "2026-10-05",
    massInKg: "90",
    massOutKg: nibsKg,
    shellKg: "10",
    submissionKey: key(),
  });
  return lot;
}

/** Plans a batch through the same schema and service the action uses. */
export async function planTestBatch(team: Team, setup: Awaited<ReturnType<typeof productionSetup>>, fields: Record<string, string> = {}) {
  const input = planBatchSchema.parse({
    recipeId: setup.recipeId,
    amount: "25",
    unit: "kg",
    stationId: setup.stationId,
    machineId: setup.machineId,
    plannedFor: "2026-12-03",
    ...fields,
  });
  return planBatch({ workspaceId: team.workspaceId, userId: team.people.production.id, input });
}
