import type { Metadata } from "next";
import { loadCostingPage } from "@/app/(app)/costing/load";
import { CostBreakdown } from "@/components/costing/cost-breakdown";
import { CostsNotAllowed } from "@/components/costing/costs-not-allowed";
import { PrintButton } from "@/components/costing/print-button";
import { PrintComparison } from "@/components/costing/print-comparison";
import { ScenarioCards } from "@/components/costing/scenario-cards";
import { formatDate } from "@/lib/format";

type PageProps = { params: Promise<{ recipeId: string }>; searchParams: Promise<Record<string, string | string[] | undefined>> };

export const metadata: Metadata = { title: "Costing · print" };

/** The supplier comparison and cost of one saved version, laid out for paper (no app chrome). */
export default async function PrintCostingPage({ params, searchParams }: PageProps) {
  const { viewer, costing } = await loadCostingPage((await params).recipeId, (await searchParams).version);
  if (!costing) {
    return (
      <main className="p-8">
        <CostsNotAllowed />
      </main>
    );
  }
  const { recipe, version, report, baseCurrency: currency, settings } = costing;
  return (
    <main className="mx-auto max-w-5xl space-y-6 bg-white p-8 print:p-0">
      <header className="flex items-start justify-between gap-4 border-b border-sand pb-4">
        <div>
          <p className="text-xs uppercase tracking-wide text-cocoa-500">{viewer.workspace.name} · cost and suppliers</p>
          <h1 className="text-2xl font-bold">
            {recipe.name} v{version.versionNo}
          </h1>
          <p className="text-sm text-cocoa-700">
            Prices of {formatDate(costing.on)} in {currency} (quotes valid that day, that day&apos;s exchange rates). Printed by {viewer.user.name}.
          </p>
        </div>
        <PrintButton />
      </header>
      {costing.currencyProblem ? <p className="text-sm text-brick">{costing.currencyProblem}</p> : null}
      <ScenarioCards report={report} currency={currency} />
      <CostBreakdown scenario={report.scenarios.chosen} settings={settings} currency={currency} barMassGrams={version.barMassGrams} />
      <section className="break-inside-avoid">
        <h2 className="mb-2 text-lg font-bold">Suppliers</h2>
        <PrintComparison report={report} currency={currency} />
      </section>
      <p className="text-xs text-cocoa-500">Figures rounded for display; computed exactly. Supplier prices are the buyer&apos;s recorded quotes.</p>
    </main>
  );
}
