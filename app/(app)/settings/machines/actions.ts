"use server";

import { revalidatePath } from "next/cache";
import { defineAction, defineFormAction } from "@/lib/actions/define-action";
import { archiveMachine, archiveStation, createMachine, createStation } from "@/lib/data/machines";
import { createMachineSchema, createStationSchema, machineIdSchema, stationIdSchema } from "@/lib/validation/machines";

const PATH = "/settings/machines";

export const createMachineAction = defineFormAction({
  schema: createMachineSchema,
  permission: "machines.manage",
  handler: async (input, viewer) => {
    const machine = await createMachine({ workspaceId: viewer.workspace.id, ...input });
    revalidatePath(PATH);
    return machine;
  },
});

export const createStationAction = defineFormAction({
  schema: createStationSchema,
  permission: "machines.manage",
  handler: async (input, viewer) => {
    const station = await createStation({ workspaceId: viewer.workspace.id, ...input });
    revalidatePath(PATH);
    return station;
  },
});

export const archiveMachineAction = defineAction({
  schema: machineIdSchema,
  permission: "machines.manage",
  handler: async (input, viewer) => {
    await archiveMachine({ workspaceId: viewer.workspace.id, machineId: input.machineId });
    revalidatePath(PATH);
  },
});

export const archiveStationAction = defineAction({
  schema: stationIdSchema,
  permission: "machines.manage",
  handler: async (input, viewer) => {
    await archiveStation({ workspaceId: viewer.workspace.id, stationId: input.stationId });
    revalidatePath(PATH);
  },
});
