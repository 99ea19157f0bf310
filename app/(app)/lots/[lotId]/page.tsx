import type { Metadata } from "next";
import { notFound } from "next/navigation";
import { LotBatches } from "@/components/batches/lot-batches";
import { FilePanel } from "@/components/files/file-panel";
import { LotCostForm } from "@/components/lots/lot-cost-form";
import { CutTestForm } from "@/components/lots/cut-test-form";
import { CutTestTable } from "@/components/lots/cut-test-table";
import { NibCostCard } from "@/components/lots/nib-cost-card";
import { ProcessingForm } from "@/components/lots/processing-form";
import { ProcessingTable } from "@/components/lots/processing-table";
import { YieldChain } from "@/components/lots/yield-chain";
import { Card, CardHeader } from "@/components/ui/card";
import { requireViewer } from "@/lib/auth/current";
import { can } from "@/lib/auth/permissions";
import { getLotForViewer } from "@/lib/cost-visibility/lots";
import { listRoastPresets } from "@/lib/data/lots";
import { AppError } from "@/lib/errors";
import { formatDate, formatKg, formatMoney, formatPercent } from "@/lib/format";
import { idSchema } from "@/lib/validation/auth";

export const metadata: Metadata = { title: "Bean lot" };

export default async function LotPage({ params }: { params: Promise<{ lotId: string }> }) {
  const viewer = await requireViewer();
  const { lotId } = await params;
  if (!idSchema.safeParse(lotId).success) notFound();
  let detail;
  try {
    detail = await getLotForViewer({ viewer, lotId });
  } catch (err) {
    if (err instanceof AppError && err.code === "not_found") notFound();
    throw err;
  }
  const presets = can(viewer.role, "lots.process") ? await listRoastPresets({ workspaceId: viewer.workspace.id }) : [];
  const { lot, chain, nibCost, baseCurrency, costsShown } = detail;
  const facts: [string, string][] = [
    ["Origin", [lot.originCountry, lot.originRegion].filter(Boolean).join(", ")],
    ["Farm or cooperative", lot.producer ?? "—"],
    ["Supplier", detail.supplierName ?? "—"],
    ["Harvest", lot.harvestYear ? String(lot.harvestYear) : "—"],
    ["Arrived", formatDate(lot.arrivedOn)],
    ["Received", formatKg(lot.massReceivedKg, 1)],
    ["Moisture on arrival", formatPercent(lot.moisturePercent)],
  ];
  // Money only for those who may see costs (lib/auth/costs.ts); the rest of the page is the same for everyone.
  if (lot.pricePaid !== null) facts.push(["Price paid", formatMoney(lot.pricePaid, lot.currency)]);
  return (
    <div className="space-y-8">
      <div>
        <p className="text-sm font-semibold uppercase tracking-widest text-pod-dark">Bean lot</p>
        <h1 className="mt-1 text-3xl font-bold">{lot.code}</h1>
        <dl className="mt-4 grid gap-x-8 gap-y-2 text-sm sm:grid-cols-2 lg:grid-cols-4">
          {facts.map(([k, v]) => (
            <div key={k}>
              <dt className="text-cocoa-500">{k}</dt>
              <dd className="figures font-semibold">{v}</dd>
            </div>
          ))}
        </dl>
      </div>
      <div className={nibCost ? "grid grid-cols-1 gap-6 lg:grid-cols-[minmax(0,1fr)_22rem]" : undefined}>
        <Card>
          <CardHeader title="From beans to nibs" description="Mass after each step, and each step's yield against the usual range." />
          <YieldChain received={lot.massReceivedKg} chain={chain} />
        </Card>
        {nibCost && lot.pricePaid !== null ? (
          <NibCostCard
            nibCost={nibCost}
            chain={chain}
            baseCurrency={baseCurrency}
            costs={detail.costs}
            lot={{ pricePaid: lot.pricePaid, currency: lot.currency }}
            processingCost={detail.processingCost}
          />
        ) : null}
      </div>
      <LotBatches workspaceId={viewer.workspace.id} lotId={lot.id} />
      <Card>
        <CardHeader title="Processing records" description="Insert-only: a wrong record is corrected by a new one, with a note." />
        <ProcessingTable records={detail.records} showCost={costsShown} />
        {can(viewer.role, "lots.process") ? (
          <div className="mt-6 border-t border-sand pt-6">
            <ProcessingForm lotId={lot.id} presets={presets.map((p) => ({ id: p.id, name: p.name, temperatureC: p.temperatureC, minutes: p.minutes }))} />
          </div>
        ) : null}
      </Card>
      <div className="grid grid-cols-1 gap-6 lg:grid-cols-2">
        <Card>
          <CardHeader title="Cut tests" description="Beans cut lengthwise from a sample, counted by what their inside shows." />
          <CutTestTable tests={detail.cutTests} />
          {can(viewer.role, "lots.edit") ? (
            <div className="mt-6 border-t border-sand pt-6">
              <CutTestForm lotId={lot.id} />
            </div>
          ) : null}
        </Card>
        {can(viewer.role, "lots.edit") ? (
          <Card>
            <CardHeader title="Add a cost" description="Freight, duty, insurance, storage — anything paid to get these beans here." />
            <LotCostForm lotId={lot.id} currency={lot.currency} />
          </Card>
        ) : null}
      </div>
      <Card>
        <CardHeader title="Certificates and reports" description="Certificates of origin, organic certificates, lab reports: PDF, PNG or JPEG." />
        <FilePanel owner={{ kind: "lots", id: lot.id }} canEdit={can(viewer.role, "lots.edit")} />
      </Card>
    </div>
  );
}
