import "server-only";
import Decimal from "decimal.js";
import { and, eq, inArray } from "drizzle-orm";
import { db } from "@/db/client";
import { batches, batchLines, ingredients, roastPresets, type ChocolateType, type IngredientKind, type StoredLoad } from "@/db/schema";
import { batchMassKg } from "@/lib/batches/batch-mass";
import { precisionWarnings } from "@/lib/batches/precision";
import { invalid, notFound } from "@/lib/errors";
import { scaleBatch } from "@/lib/formulation";
import { MAX_BATCH_KG, type PlanBatchInput, type PreviewBatchInput } from "@/lib/validation/batches";
import { getMachine, getStation, type MachineRecord, type StationRecord } from "./machines";
import { plain } from "./numeric";
import { getRecipe } from "./recipes";
import { getVersion } from "./recipes-versions";
import { insertWithNextCode } from "./sequence-code";

export type PlannedLine = {
  position: number;
  ingredientId: string;
  ingredientName: string;
  ingredientKind: IngredientKind;
  percent: string;
  allergens: string[];
  massGrams: string;
};

export type ScaledPlan = {
  recipe: { id: string; name: string; chocolateType: ChocolateType };
  version: { id: string; versionNo: number; barMassGrams: string };
  station: StationRecord;
  machine: MachineRecord | null;
  requestedMassGrams: string;
  totalMassGrams: string;
  lines: PlannedLine[];
  loads: StoredLoad[];
  notes: string[];
};

const sizeError = (message: string) => invalid(message, { amount: [message] });

/**
 * A batch as it would be planned, not saved: the recipe's current released
 * version scaled by the engine (scaleBatch) to the mass asked for, at the
 * station's resolution, split into equal loads of the machine. Production
 * plans from released versions only.
 */
export async function scalePlan({ workspaceId, input }: { workspaceId: string; input: PreviewBatchInput }): Promise<ScaledPlan> {
  const recipe = await getRecipe({ workspaceId, recipeId: input.recipeId });
  if (!recipe.releasedVersionNo) {
    const message = "This recipe has no released version yet. Batches are planned from released versions only.";
    throw invalid(message, { recipeId: [message] });
  }
  const version = await getVersion({ workspaceId, recipeId: recipe.id, versionNo: recipe.releasedVersionNo });
  const [station, machine] = await Promise.all([
    getStation({ workspaceId, stationId: input.stationId }),
    input.machineId ? getMachine({ workspaceId, machineId: input.machineId }) : Promise.resolve(null),
  ]);
  const massKg = batchMassKg(input.amount, input.unit, version.barMassGrams);
  if (new Decimal(massKg).gt(MAX_BATCH_KG)) throw sizeError("That is more than 1,000 t in one batch. Check the unit.");
  const scaled = scaleBatch(version.lines, { totalMassKg: massKg, resolutionGrams: station.resolutionGrams, machineCapacityKg: machine?.capacityKg });
  if (!scaled.ok) throw sizeError(scaled.reason);
  const kinds = await ingredientKinds(workspaceId, version.lines.map((l) => l.ingredientId));
  return {
    recipe: { id: recipe.id, name: recipe.name, chocolateType: recipe.chocolateType },
    version: { id: version.id, versionNo: version.versionNo, barMassGrams: plain(version.barMassGrams) },
    station,
    machine,
    requestedMassGrams: scaled.requestedMassGrams,
    totalMassGrams: scaled.totalMassGrams,
    lines: scaled.lines.map((l, i) => ({
      position: i + 1,
      ingredientId: l.ingredientId,
      ingredientName: l.name,
      ingredientKind: kinds.get(l.ingredientId) ?? "other",
      percent: plain(l.percent),
      allergens: l.allergens,
      massGrams: l.massGrams,
    })),
    loads: scaled.loads,
    notes: [...scaled.notes, ...precisionWarnings(scaled.lines, scaled.totalMassGrams, station.resolutionGrams)],
  };
}

async function ingredientKinds(workspaceId: string, ids: string[]): Promise<Map<string, IngredientKind>> {
  if (ids.length === 0) return new Map();
  const rows = await db
    .select({ id: ingredients.id, kind: ingredients.kind })
    .from(ingredients)
    .where(and(eq(ingredients.workspaceId, workspaceId), inArray(ingredients.id, ids)));
  return new Map(rows.map((r) => [r.id, r.kind]));
}

async function roastPreset(workspaceId: string, presetId: string | null) {
  if (!presetId) return null;
  const [p] = await db
    .select({ name: roastPresets.name, temperatureC: roastPresets.temperatureC, minutes: roastPresets.minutes })
    .from(roastPresets)
    .where(and(eq(roastPresets.workspaceId, workspaceId), eq(roastPresets.id, presetId)));
  if (!p) throw notFound("That roast preset");
  return p;
}

/** Plans and saves a batch under the next batch code; its masses are never recomputed. */
export async function planBatch({
  workspaceId,
  userId,
  input,
  now = new Date(),
}: {
  workspaceId: string;
  userId: string | null;
  input: PlanBatchInput;
  now?: Date;
}): Promise<{ id: string; code: string }> {
  const plan = await scalePlan({ workspaceId, input });
  const preset = await roastPreset(workspaceId, input.roastPresetId);
  return db.transaction((tx) =>
    insertWithNextCode({
      executor: tx,
      table: batches,
      workspaceColumn: batches.workspaceId,
      codeColumn: batches.code,
      constraint: "batches_workspace_code",
      workspaceId,
      prefix: "B",
      year: now.getUTCFullYear(),
      insert: async (code, sp) => {
        const [row] = await sp
          .insert(batches)
          .values({
            workspaceId,
            code,
            recipeId: plan.recipe.id,
            versionId: plan.version.id,
            versionNo: plan.version.versionNo,
            recipeName: plan.recipe.name,
            chocolateType: plan.recipe.chocolateType,
            barMassGrams: plan.version.barMassGrams,
            plannedFor: input.plannedFor,
            requestedAmount: input.amount,
            requestedUnit: input.unit,
            requestedMassGrams: plan.requestedMassGrams,
            totalMassGrams: plan.totalMassGrams,
            resolutionGrams: plan.station.resolutionGrams,
            stationId: plan.station.id,
            stationName: plan.station.name,
            stationCapacityKg: plan.station.capacityKg,
            machineId: plan.machine?.id ?? null,
            machineName: plan.machine?.name ?? null,
            machineCapacityKg: plan.machine?.capacityKg ?? null,
            loadCount: plan.loads.length,
            loads: plan.loads,
            scaleNotes: plan.notes,
            roastPresetName: preset?.name ?? null,
            roastTemperatureC: preset?.temperatureC ?? null,
            roastMinutes: preset?.minutes ?? null,
            refiningHours: input.refiningHours,
            conchingHours: input.conchingHours,
            notes: input.notes,
            createdById: userId,
          })
          .returning({ id: batches.id });
        await sp.insert(batchLines).values(
          plan.lines.map((l) => ({
            batchId: row!.id,
            position: l.position,
            ingredientId: l.ingredientId,
            ingredientName: l.ingredientName,
            ingredientKind: l.ingredientKind,
            percent: l.percent,
            massGrams: l.massGrams,
            allergens: l.allergens,
          })),
        );
        return { id: row!.id, code };
      },
    }),
  );
}
