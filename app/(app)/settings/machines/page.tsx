import type { Metadata } from "next";
import { MachineForm, RetireButton, StationForm } from "@/components/batches/machine-forms";
import { Card, CardHeader } from "@/components/ui/card";
import { Table, Td, Th } from "@/components/ui/table";
import { requireViewer } from "@/lib/auth/current";
import { can } from "@/lib/auth/permissions";
import { listMachines, listStations } from "@/lib/data/machines";
import { formatNumber } from "@/lib/format";

export const metadata: Metadata = { title: "Machines and scales" };

const KIND = { refiner: "Refiner (melanger)", conche: "Conche", tempering: "Tempering machine" } as const;

export default async function MachinesPage() {
  const viewer = await requireViewer();
  const [machines, stations] = await Promise.all([listMachines({ workspaceId: viewer.workspace.id }), listStations({ workspaceId: viewer.workspace.id })]);
  const manage = can(viewer.role, "machines.manage");
  return (
    <div className="max-w-4xl space-y-8">
      <div>
        <h1 className="text-3xl font-bold">Machines and scales</h1>
        <p className="mt-2 text-cocoa-700">
          A batch is split into equal loads of one machine, and weighed in whole steps of one scale.
        </p>
      </div>
      <Card>
        <CardHeader title="Machines" />
        <Table data-testid="machines">
          <thead>
            <tr>
              <Th>Name</Th>
              <Th>Kind</Th>
              <Th numeric>Capacity</Th>
              {manage ? <Th /> : null}
            </tr>
          </thead>
          <tbody>
            {machines.length === 0 ? (
              <tr>
                <Td colSpan={4} className="text-cocoa-500">No machine yet.</Td>
              </tr>
            ) : (
              machines.map((m) => (
                <tr key={m.id}>
                  <Td className="font-semibold">{m.name}</Td>
                  <Td>{KIND[m.kind]}</Td>
                  <Td numeric>{formatNumber(m.capacityKg, 1)} kg</Td>
                  {manage ? <Td numeric><RetireButton kind="machine" id={m.id} name={m.name} /></Td> : null}
                </tr>
              ))
            )}
          </tbody>
        </Table>
        {manage ? (
          <div className="mt-6 border-t border-sand pt-6">
            <MachineForm />
          </div>
        ) : null}
      </Card>
      <Card>
        <CardHeader title="Weighing stations" description="The step is the smallest change the scale shows (its resolution)." />
        <Table data-testid="stations">
          <thead>
            <tr>
              <Th>Name</Th>
              <Th numeric>Step</Th>
              <Th numeric>Capacity</Th>
              {manage ? <Th /> : null}
            </tr>
          </thead>
          <tbody>
            {stations.length === 0 ? (
              <tr>
                <Td colSpan={4} className="text-cocoa-500">No weighing station yet.</Td>
              </tr>
            ) : (
              stations.map((s) => (
                <tr key={s.id}>
                  <Td className="font-semibold">{s.name}</Td>
                  <Td numeric>{s.resolutionGrams} g</Td>
                  <Td numeric>{s.capacityKg ? `${formatNumber(s.capacityKg, 1)} kg` : "—"}</Td>
                  {manage ? <Td numeric><RetireButton kind="station" id={s.id} name={s.name} /></Td> : null}
                </tr>
              ))
            )}
          </tbody>
        </Table>
        {manage ? (
          <div className="mt-6 border-t border-sand pt-6">
            <StationForm />
          </div>
        ) : null}
      </Card>
    </div>
  );
}
