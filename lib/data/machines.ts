import "server-only";
import { and, asc, eq, isNull } from "drizzle-orm";
import { db } from "@/db/client";
import { machines, weighingStations, type MachineKind } from "@/db/schema";
import { conflict, notFound } from "@/lib/errors";
import { plain } from "./numeric";
import { isUniqueViolation } from "./pg-errors";

export type MachineRecord = { id: string; name: string; kind: MachineKind; capacityKg: string };
export type StationRecord = { id: string; name: string; resolutionGrams: string; capacityKg: string | null };

/** The workspace's machines in use, by kind then name. */
export async function listMachines({ workspaceId }: { workspaceId: string }): Promise<MachineRecord[]> {
  const rows = await db
    .select({ id: machines.id, name: machines.name, kind: machines.kind, capacityKg: machines.capacityKg })
    .from(machines)
    .where(and(eq(machines.workspaceId, workspaceId), isNull(machines.archivedAt)))
    .orderBy(asc(machines.kind), asc(machines.name));
  return rows.map((r) => ({ ...r, capacityKg: plain(r.capacityKg) }));
}

/** The workspace's weighing stations in use, finest first. */
export async function listStations({ workspaceId }: { workspaceId: string }): Promise<StationRecord[]> {
  const rows = await db
    .select({ id: weighingStations.id, name: weighingStations.name, resolutionGrams: weighingStations.resolutionGrams, capacityKg: weighingStations.capacityKg })
    .from(weighingStations)
    .where(and(eq(weighingStations.workspaceId, workspaceId), isNull(weighingStations.archivedAt)))
    .orderBy(asc(weighingStations.resolutionGrams), asc(weighingStations.name));
  return rows.map((r) => ({ ...r, resolutionGrams: plain(r.resolutionGrams), capacityKg: plain(r.capacityKg) }));
}

/** One machine in use, or not found (archived ones cannot be planned on). */
export async function getMachine({ workspaceId, machineId }: { workspaceId: string; machineId: string }): Promise<MachineRecord> {
  const found = (await listMachines({ workspaceId })).find((m) => m.id === machineId);
  if (!found) throw notFound("That machine");
  return found;
}

export async function getStation({ workspaceId, stationId }: { workspaceId: string; stationId: string }): Promise<StationRecord> {
  const found = (await listStations({ workspaceId })).find((s) => s.id === stationId);
  if (!found) throw notFound("That weighing station");
  return found;
}

export async function createMachine(input: { workspaceId: string; name: string; kind: MachineKind; capacityKg: string }) {
  try {
    const [row] = await db.insert(machines).values(input).returning({ id: machines.id });
    return { id: row!.id };
  } catch (err) {
    if (isUniqueViolation(err, "machines_workspace_name")) throw conflict(`A machine named ${input.name} already exists.`);
    throw err;
  }
}

export async function createStation(input: { workspaceId: string; name: string; resolutionGrams: string; capacityKg: string | null }) {
  try {
    const [row] = await db.insert(weighingStations).values(input).returning({ id: weighingStations.id });
    return { id: row!.id };
  } catch (err) {
    if (isUniqueViolation(err, "weighing_stations_workspace_name")) throw conflict(`A weighing station named ${input.name} already exists.`);
    throw err;
  }
}

/** Retires a machine: past batches keep its name and capacity as they were planned. */
export async function archiveMachine({ workspaceId, machineId }: { workspaceId: string; machineId: string }) {
  const rows = await db
    .update(machines)
    .set({ archivedAt: new Date() })
    .where(and(eq(machines.workspaceId, workspaceId), eq(machines.id, machineId), isNull(machines.archivedAt)))
    .returning({ id: machines.id });
  if (rows.length === 0) throw notFound("That machine");
}

export async function archiveStation({ workspaceId, stationId }: { workspaceId: string; stationId: string }) {
  const rows = await db
    .update(weighingStations)
    .set({ archivedAt: new Date() })
    .where(and(eq(weighingStations.workspaceId, workspaceId), eq(weighingStations.id, stationId), isNull(weighingStations.archivedAt)))
    .returning({ id: weighingStations.id });
  if (rows.length === 0) throw notFound("That weighing station");
}
