/**
 * A batch plan from a version's lines, a mass, a scale and a machine: the
 * engine's scaleBatch does the arithmetic; this shapes its result into the rows
 * a batch stores, with our precision warnings. Pure, so the planning service
 * and the demo seed build plans the same way.
 */
import type { StoredLoad } from "@/db/schema/batches";
import type { IngredientKind } from "@/db/schema/ingredients";
import type { ChocolateType } from "@/db/schema/recipes";
import { scaleBatch } from "@/lib/formulation";
import { precisionWarnings } from "./precision";

export type PlannedLine = {
  position: number;
  ingredientId: string;
  ingredientName: string;
  ingredientKind: IngredientKind;
  percent: string;
  allergens: string[];
  massGrams: string;
};

export type PlanStation = { id: string; name: string; resolutionGrams: string; capacityKg: string | null };
export type PlanMachine = { id: string; name: string; capacityKg: string };

export type ScaledPlan = {
  recipe: { id: string; name: string; chocolateType: ChocolateType };
  version: { id: string; versionNo: number; barMassGrams: string };
  station: PlanStation;
  machine: PlanMachine | null;
  requestedMassGrams: string;
  totalMassGrams: string;
  lines: PlannedLine[];
  loads: StoredLoad[];
  notes: string[];
};

export function buildPlan(input: {
  recipe: ScaledPlan["recipe"];
  version: ScaledPlan["version"] & { lines: ReadonlyArray<{ ingredientId: string; name: string; percent: string; allergens: string[] }> };
  kinds: ReadonlyMap<string, IngredientKind>;
  station: PlanStation;
  machine: PlanMachine | null;
  massKg: string;
}): { ok: true; plan: ScaledPlan } | { ok: false; reason: string } {
  const { version, station, machine } = input;
  const scaled = scaleBatch(version.lines, { totalMassKg: input.massKg, resolutionGrams: station.resolutionGrams, machineCapacityKg: machine?.capacityKg });
  if (!scaled.ok) return scaled;
  return {
    ok: true,
    plan: {
      recipe: input.recipe,
      version: { id: version.id, versionNo: version.versionNo, barMassGrams: version.barMassGrams },
      station,
      machine,
      requestedMassGrams: scaled.requestedMassGrams,
      totalMassGrams: scaled.totalMassGrams,
      lines: scaled.lines.map((l, i) => ({
        position: i + 1,
        ingredientId: l.ingredientId,
        ingredientName: l.name,
        ingredientKind: input.kinds.get(l.ingredientId) ?? "other",
        percent: l.percent,
        allergens: l.allergens,
        massGrams: l.massGrams,
      })),
      loads: scaled.loads,
      notes: [...scaled.notes, ...precisionWarnings(scaled.lines, scaled.totalMassGrams, station.resolutionGrams)],
    },
  };
}

/** The `batches` row of a plan (without workspace, code and the planner's extras). */
export function batchRowOf(plan: ScaledPlan) {
  return {
    recipeId: plan.recipe.id,
    versionId: plan.version.id,
    versionNo: plan.version.versionNo,
    recipeName: plan.recipe.name,
    chocolateType: plan.recipe.chocolateType,
    barMassGrams: plan.version.barMassGrams,
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
  };
}

/** The `batch_lines` rows of a plan. */
export function batchLineRowsOf(batchId: string, plan: ScaledPlan) {
  return plan.lines.map((l) => ({ batchId, ...l }));
}
