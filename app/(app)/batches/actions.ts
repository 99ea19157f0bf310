"use server";

import { revalidatePath } from "next/cache";
import { defineAction, defineFormAction } from "@/lib/actions/define-action";
import { cancelBatch } from "@/lib/data/batches";
import { planBatch } from "@/lib/data/batches-plan";
import { recordRun } from "@/lib/data/runs";
import { batchIdSchema, planBatchSchema, recordRunSchema } from "@/lib/validation/batches";

/** Plans a batch from a recipe's released version; the page then opens it. */
export const planBatchAction = defineFormAction({
  schema: planBatchSchema,
  permission: "batches.plan",
  handler: async (input, viewer) => {
    const batch = await planBatch({ workspaceId: viewer.workspace.id, userId: viewer.user.id, input });
    revalidatePath("/batches");
    return batch;
  },
});

/** Records what a run used and completes the batch (consumes nibs from lots). */
export const recordRunAction = defineAction({
  schema: recordRunSchema,
  permission: "batches.plan",
  handler: async (input, viewer) => {
    const run = await recordRun({ workspaceId: viewer.workspace.id, userId: viewer.user.id, input });
    revalidatePath(`/batches/${input.batchId}`);
    revalidatePath("/batches");
    revalidatePath("/lots", "layout");
    return run;
  },
});

export const cancelBatchAction = defineAction({
  schema: batchIdSchema,
  permission: "batches.plan",
  handler: async (input, viewer) => {
    await cancelBatch({ workspaceId: viewer.workspace.id, batchId: input.batchId });
    revalidatePath(`/batches/${input.batchId}`);
    revalidatePath("/batches");
  },
});
