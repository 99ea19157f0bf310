import { z } from "zod";
import { machineKinds } from "@/db/schema/batches";
import { decimalText, optionalDecimalText } from "./decimal";

const name = z.string().trim().min(1, "Give it a name.").max(80, "Keep the name to 80 characters.");

export const createMachineSchema = z
  .object({
    name,
    kind: z.enum(machineKinds, "Choose refiner, conche or tempering machine."),
    capacityKg: decimalText({ label: "the capacity", max: "100000", decimals: 3, positive: true }),
  })
  .strict();

export const createStationSchema = z
  .object({
    name,
    resolutionGrams: decimalText({ label: "the resolution", max: "10000", decimals: 3, positive: true }),
    capacityKg: optionalDecimalText({ label: "the capacity", max: "100000", decimals: 3, positive: true }),
  })
  .strict();

export const machineIdSchema = z.object({ machineId: z.string().uuid("Unknown machine.") }).strict();
export const stationIdSchema = z.object({ stationId: z.string().uuid("Unknown weighing station.") }).strict();
