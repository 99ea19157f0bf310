import "server-only";
import Decimal from "decimal.js";
import { and, eq, inArray } from "drizzle-orm";
import { db } from "@/db/client";
import { batches, batchLines, ingredients, roastPresets, type IngredientKind } from "@/db/schema";
import { batchMassKg } from "@/lib/batches/batch-mass";
import { batchLineRowsOf, batchRowOf, buildPlan, type ScaledPlan } from "@/lib/batches/build-plan";
import { invalid, notFound } from "@/lib/errors";
import { MAX_BATCH_KG, type PlanBatchInput, type PreviewBatchInput } from "@/lib/validation/batches";
import { getMachine, getStation } from "./machines";
import { plain } from "./numeric";
import { getRecipe } from "./recipes";
import { getVersion } from "./recipes-versions";
import { insertWithNextCode } from "./sequence-code";

export type { PlannedLine, ScaledPlan } from "@/lib/batches/build-plan";

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
  const built = buildPlan({
    recipe: { id: recipe.id, name: recipe.name, chocolateType: recipe.chocolateType },
    version: { ...version, barMassGrams: plain(version.barMassGrams), lines: version.lines.map((l) => ({ ...l, percent: plain(l.percent) })) },
    kinds: await ingredientKinds(workspaceId, version.lines.map((l) => l.ingredientId)),
    station,
    machine,
    massKg,
  });
  if (!built.ok) throw sizeError(built.reason);
  return built.plan;
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
            ...batchRowOf(plan),
            workspaceId,
            code,
            plannedFor: input.plannedFor,
            requestedAmount: input.amount,
            requestedUnit: input.unit,
            roastPresetName: preset?.name ?? null,
            roastTemperatureC: preset?.temperatureC ?? null,
            roastMinutes: preset?.minutes ?? null,
            refiningHours: input.refiningHours,
            conchingHours: input.conchingHours,
            notes: input.notes,
            createdById: userId,
          })
          .returning({ id: batches.id });
        await sp.insert(batchLines).values(batchLineRowsOf(row!.id, plan));
        return { id: row!.id, code };
      },
    }),
  );
}
