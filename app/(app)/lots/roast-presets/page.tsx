import type { Metadata } from "next";
import { RoastPresetForm } from "@/components/lots/roast-preset-form";
import { Card, CardHeader } from "@/components/ui/card";
import { Table, Td, Th } from "@/components/ui/table";
import { requireViewer } from "@/lib/auth/current";
import { can } from "@/lib/auth/permissions";
import { listRoastPresets } from "@/lib/data/lots";
import { celsiusToFahrenheit } from "@/lib/formulation";
import { formatNumber } from "@/lib/format";

export const metadata: Metadata = { title: "Roast presets" };

export default async function RoastPresetsPage() {
  const viewer = await requireViewer();
  const presets = await listRoastPresets({ workspaceId: viewer.workspace.id });
  return (
    <div className="max-w-4xl space-y-6">
      <div>
        <h1 className="text-3xl font-bold">Roast presets</h1>
        <p className="mt-2 text-cocoa-700">Named roast settings to pick when recording a roast.</p>
        <p className="mt-3 rounded-md bg-pod-light px-3 py-2 text-sm text-pod-dark" role="note">
          Roasting also reduces the microbes raw beans carry. A preset is a convenience, not a validated kill step: local
          food-safety rules and your validated process govern time and temperature.
        </p>
      </div>
      <Table>
        <thead>
          <tr>
            <Th>Name</Th>
            <Th numeric>Temperature</Th>
            <Th numeric>Time</Th>
            <Th>Notes</Th>
          </tr>
        </thead>
        <tbody>
          {presets.length === 0 ? (
            <tr>
              <Td colSpan={4} className="text-cocoa-500">No preset yet.</Td>
            </tr>
          ) : (
            presets.map((p) => (
              <tr key={p.id}>
                <Td className="font-semibold">{p.name}</Td>
                <Td numeric>
                  {formatNumber(p.temperatureC)} °C / {formatNumber(celsiusToFahrenheit(p.temperatureC))} °F
                </Td>
                <Td numeric>{formatNumber(p.minutes, 0)} min</Td>
                <Td>{p.notes ?? ""}</Td>
              </tr>
            ))
          )}
        </tbody>
      </Table>
      {can(viewer.role, "lots.process") ? (
        <Card>
          <CardHeader title="New preset" />
          <RoastPresetForm />
        </Card>
      ) : null}
    </div>
  );
}
