import type { Metadata } from "next";
import { ComparisonTable } from "@/components/costing/comparison-table";
import { CostBreakdown } from "@/components/costing/cost-breakdown";
import { CostSettingsForm } from "@/components/costing/cost-settings-form";
import { CostingHeader } from "@/components/costing/costing-header";
import { CostsNotAllowed } from "@/components/costing/costs-not-allowed";
import { ScenarioCards } from "@/components/costing/scenario-cards";
import { SensitivityPanel } from "@/components/costing/sensitivity-panel";
import { SettingsHistory } from "@/components/costing/settings-history";
import { SupplierChart } from "@/components/costing/supplier-chart";
import { Card, CardHeader } from "@/components/ui/card";
import { listCostSettings } from "@/lib/data/cost-settings";
import { loadCostingPage } from "../load";

type PageProps = { params: Promise<{ recipeId: string }>; searchParams: Promise<Record<string, string | string[] | undefined>> };

export async function generateMetadata({ params, searchParams }: PageProps): Promise<Metadata> {
  const { costing } = await loadCostingPage((await params).recipeId, (await searchParams).version);
  return { title: costing ? `${costing.recipe.name} · costing` : "Costing" };
}

/** What one version of a recipe costs, from whom to buy each ingredient, and how the margin moves with prices. */
export default async function RecipeCostingPage({ params, searchParams }: PageProps) {
  const { viewer, costing, canEdit } = await loadCostingPage((await params).recipeId, (await searchParams).version);
  if (!costing) return <CostsNotAllowed />;
  const { recipe, version, report, baseCurrency: currency, settings } = costing;
  const history = await listCostSettings({ workspaceId: viewer.workspace.id, recipeId: recipe.id, limit: 5 });
  const chosen = report.scenarios.chosen;
  return (
    <>
      <CostingHeader recipe={recipe} versionNo={version.versionNo} versionNumbers={costing.versionNumbers} on={costing.on} currency={currency} />
      <div className="space-y-8">
        {costing.currencyProblem ? (
          <p role="alert" className="rounded-lg bg-brick-light px-3 py-2 text-sm text-brick">
            {costing.currencyProblem}
          </p>
        ) : null}
        <ScenarioCards report={report} currency={currency} />
        <CostBreakdown scenario={chosen} settings={settings} currency={currency} barMassGrams={version.barMassGrams} />
        <Card>
          <CardHeader
            title="Suppliers"
            description={`Current quotes per kg in ${currency}, and the nib cost of each bean lot for nibs. The cheapest source of each ingredient is highlighted.`}
          />
          <ComparisonTable recipeId={recipe.id} report={report} currency={currency} canEdit={canEdit} />
          <h3 className="mb-2 mt-8 font-bold">Cost per bar by source</h3>
          <p className="mb-3 text-sm text-cocoa-500">
            Each bar: the chosen combination with that one source swapped in for its ingredient. The axis starts near the lowest figure so that small
            differences show; hover a bar for its exact cost.
          </p>
          <SupplierChart swaps={report.swaps} chosenPerBar={chosen.cost.ok ? chosen.cost.costPerBar : null} currency={currency} />
        </Card>
        <SensitivityPanel lines={costing.lines} choices={chosen.choices} settings={settings} barMassGrams={version.barMassGrams} currency={currency} />
        <Card>
          <CardHeader title="Cost settings" description={`For every version of ${recipe.name}; money in ${currency}. Each save keeps the one before.`} />
          <CostSettingsForm
            key={costing.settingsRecord.revision}
            recipeId={recipe.id}
            settings={settings}
            revision={costing.settingsRecord.revision}
            currency={currency}
            canEdit={canEdit}
          />
          <div className="mt-6 border-t border-sand-light pt-4">
            <SettingsHistory history={history} />
          </div>
        </Card>
      </div>
    </>
  );
}
