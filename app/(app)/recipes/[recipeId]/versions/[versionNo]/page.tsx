import type { Metadata } from "next";
import { notFound } from "next/navigation";
import { CompositionPanel } from "@/components/bench/composition-panel";
import { StandardsPanel } from "@/components/bench/standards-panel";
import { RecipeHeader } from "@/components/recipes/recipe-header";
import { VersionLinesCard } from "@/components/recipes/version-figures";
import { AUTHORITIES } from "@/lib/formulation";
import { getBaseCurrency } from "@/lib/data/exchange-rates";
import { getVersionForViewer } from "@/lib/cost-visibility/recipes";
import { versionNoSchema } from "@/lib/validation/recipes";
import { loadRecipePage, orNotFound } from "../../load";

export const metadata: Metadata = { title: "Recipe version" };

const timeFormat = new Intl.DateTimeFormat("en-GB", { day: "numeric", month: "short", year: "numeric", hour: "2-digit", minute: "2-digit" });

/** One saved version, read-only, exactly as it was computed at save. Production sees released versions only. */
export default async function VersionPage({ params }: { params: Promise<{ recipeId: string; versionNo: string }> }) {
  const p = await params;
  const { viewer, recipe, readsAll } = await loadRecipePage(p.recipeId);
  const n = versionNoSchema.safeParse(p.versionNo);
  if (!n.success) notFound();
  const workspaceId = viewer.workspace.id;
  const [{ version, costsShown }, currency] = await Promise.all([
    getVersionForViewer({ viewer, recipeId: recipe.id, versionNo: n.data }).catch(orNotFound),
    getBaseCurrency({ workspaceId }),
  ]);
  if (!version.released && !readsAll) notFound();
  return (
    <>
      <RecipeHeader recipe={recipe} current="version" readsAll={readsAll} />
      <div className="mb-6 rounded-card border border-sand bg-white p-4" data-testid="version-heading">
        <h2 className="text-xl font-bold">
          v{version.versionNo}
          {recipe.releasedVersionNo === version.versionNo ? <span className="ml-2 text-base font-semibold text-sage">released for production</span> : null}
        </h2>
        <p className="mt-1 text-sm text-cocoa-700">
          Saved {timeFormat.format(version.createdAt)} by {version.authorName ?? "someone no longer here"}
          {version.restoredFromVersionNo ? `, restoring v${version.restoredFromVersionNo}` : ""}
          {version.note ? ` — “${version.note}”` : ""}
        </p>
      </div>
      <div className="grid grid-cols-1 gap-6 lg:grid-cols-[minmax(0,1fr)_22rem]">
        <div className="space-y-6">
          <VersionLinesCard version={version} currency={currency} showCost={costsShown} />
          <StandardsPanel standards={version.evaluation.standards} chosen={AUTHORITIES} chocolateType={recipe.chocolateType} />
        </div>
        <CompositionPanel composition={version.evaluation.composition} />
      </div>
    </>
  );
}
