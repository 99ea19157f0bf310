import type { Metadata } from "next";
import Link from "next/link";
import { PlanForm } from "@/components/batches/plan-form";
import { requireViewer } from "@/lib/auth/current";
import { can } from "@/lib/auth/permissions";
import { listReleasedRecipes } from "@/lib/data/batch-recipes";
import { listRoastPresets } from "@/lib/data/lots";
import { listMachines, listStations } from "@/lib/data/machines";
import { formatNumber } from "@/lib/format";

export const metadata: Metadata = { title: "Plan a batch" };

const KIND = { refiner: "refiner", conche: "conche", tempering: "tempering machine" } as const;

export default async function NewBatchPage() {
  const viewer = await requireViewer();
  if (!can(viewer.role, "batches.plan")) {
    return <p className="text-cocoa-700">Your role reads batches; planning them is for production and the owner.</p>;
  }
  const workspaceId = viewer.workspace.id;
  const [recipes, stations, machines, presets] = await Promise.all([
    listReleasedRecipes({ workspaceId }),
    listStations({ workspaceId }),
    listMachines({ workspaceId }),
    listRoastPresets({ workspaceId }),
  ]);
  return (
    <div className="space-y-6">
      <div>
        <h1 className="text-3xl font-bold">Plan a batch</h1>
        <p className="mt-2 max-w-2xl text-cocoa-700">Batches are made from a recipe&apos;s released version, never from a draft.</p>
      </div>
      {recipes.length === 0 || stations.length === 0 ? (
        <p className="rounded-md bg-pod-light px-3 py-2 text-pod-dark" role="note">
          {recipes.length === 0 ? "No recipe has a released version yet: a formulator releases one on the recipe's page. " : ""}
          {stations.length === 0 ? (
            <>
              Add a weighing station under <Link href="/settings/machines" className="underline">Machines and scales</Link> first.
            </>
          ) : null}
        </p>
      ) : (
        <PlanForm
          today={new Date().toISOString().slice(0, 10)}
          recipes={recipes.map((r) => ({ value: r.id, label: `${r.name} — v${r.releasedVersionNo} (${formatNumber(r.barMassGrams, 0)} g bar)` }))}
          stations={stations.map((s) => ({ value: s.id, label: `${s.name} — ${s.resolutionGrams} g step${s.capacityKg ? `, up to ${formatNumber(s.capacityKg, 0)} kg` : ""}` }))}
          machines={machines.map((m) => ({ value: m.id, label: `${m.name} — ${formatNumber(m.capacityKg, 1)} kg ${KIND[m.kind]}` }))}
          presets={presets.map((p) => ({ value: p.id, label: `${p.name} (${formatNumber(p.temperatureC, 0)} °C, ${formatNumber(p.minutes, 0)} min)` }))}
        />
      )}
    </div>
  );
}
