"use server";

import { revalidatePath } from "next/cache";
import { defineFormAction } from "@/lib/actions/define-action";
import { addLotCost, createLot, createRoastPreset, recordCutTest, recordProcessing } from "@/lib/data/lots";
import { invalid } from "@/lib/errors";
import { checkChainRecord } from "@/lib/formulation";
import { createLotSchema, cutTestSchema, lotCostSchema, processingRecordSchema, roastPresetSchema } from "@/lib/validation/lots";

export const createLotAction = defineFormAction({
  schema: createLotSchema,
  permission: "lots.edit",
  handler: async (input, viewer) => {
    const lot = await createLot({ workspaceId: viewer.workspace.id, userId: viewer.user.id, input });
    revalidatePath("/lots");
    return lot;
  },
});

export const addLotCostAction = defineFormAction({
  schema: lotCostSchema,
  permission: "lots.edit",
  handler: async (input, viewer) => {
    await addLotCost({ workspaceId: viewer.workspace.id, ...input });
    revalidatePath(`/lots/${input.lotId}`);
  },
});

export const recordCutTestAction = defineFormAction({
  schema: cutTestSchema,
  permission: "lots.edit",
  handler: async (input, viewer) => {
    await recordCutTest({ workspaceId: viewer.workspace.id, userId: viewer.user.id, ...input });
    revalidatePath(`/lots/${input.lotId}`);
  },
});

/** Records sorting, roasting or winnowing; refuses masses that do not add up. Idempotent per form. */
export const recordProcessingAction = defineFormAction({
  schema: processingRecordSchema,
  permission: "lots.process",
  handler: async (input, viewer) => {
    const problems = checkChainRecord(input);
    if (problems.length > 0) throw invalid(problems.map((p) => p.message).join(" "), { massOutKg: problems.map((p) => p.message) });
    const result = await recordProcessing({
      workspaceId: viewer.workspace.id,
      performedById: viewer.user.id,
      lotId: input.lotId,
      step: input.step,
      performedOn: input.performedOn,
      massInKg: input.massInKg,
      massOutKg: input.massOutKg,
      rejectsKg: input.step === "sorting" ? (input.rejectsKg ?? null) : null,
      shellKg: input.step === "winnowing" ? (input.shellKg ?? null) : null,
      dustKg: input.step === "winnowing" ? (input.dustKg ?? null) : null,
      roastTemperatureC: input.step === "roasting" ? (input.roastTemperatureC ?? null) : null,
      roastMinutes: input.step === "roasting" ? (input.roastMinutes ?? null) : null,
      ovenLoadKg: input.step === "roasting" ? (input.ovenLoadKg ?? null) : null,
      roastPresetId: input.step === "roasting" ? (input.roastPresetId ?? null) : null,
      cost: input.cost ?? null,
      notes: input.notes ?? null,
      submissionKey: input.submissionKey,
    });
    revalidatePath(`/lots/${input.lotId}`);
    revalidatePath("/lots");
    return result;
  },
});

export const createRoastPresetAction = defineFormAction({
  schema: roastPresetSchema,
  permission: "lots.process",
  handler: async (input, viewer) => {
    const preset = await createRoastPreset({ workspaceId: viewer.workspace.id, ...input });
    revalidatePath("/lots/roast-presets");
    return preset;
  },
});
