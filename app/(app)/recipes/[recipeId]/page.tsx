import type { Metadata } from "next";
import { notFound, redirect } from "next/navigation";
import { Bench } from "@/components/bench/bench";
import { RecipeDetailsDialog } from "@/components/recipes/recipe-details-dialog";
import { RecipeHeader } from "@/components/recipes/recipe-header";
import { getBaseCurrency } from "@/lib/data/exchange-rates";
import { listBenchIngredients } from "@/lib/data/recipes-ingredients";
import { getVersion } from "@/lib/data/recipes-versions";
import { loadRecipePage } from "./load";

export async function generateMetadata({ params }: { params: Promise<{ recipeId: string }> }): Promise<Metadata> {
  const { recipe } = await loadRecipePage((await params).recipeId);
  return { title: `${recipe.name} · bench` };
}

/** The bench: the latest version on sliders (read-only for those who may not edit). */
export default async function BenchPage({ params }: { params: Promise<{ recipeId: string }> }) {
  const { viewer, recipe, readsAll, edits } = await loadRecipePage((await params).recipeId);
  // Production works from released versions only.
  if (!readsAll) {
    if (!recipe.releasedVersionNo) notFound();
    redirect(`/recipes/${recipe.id}/versions/${recipe.releasedVersionNo}`);
  }
  const workspaceId = viewer.workspace.id;
  const [latest, library, currency] = await Promise.all([
    recipe.latestVersionNo ? getVersion({ workspaceId, recipeId: recipe.id, versionNo: recipe.latestVersionNo }) : null,
    listBenchIngredients({ workspaceId, on: new Date() }),
    getBaseCurrency({ workspaceId }),
  ]);
  const base = {
    versionNo: recipe.latestVersionNo,
    barMassGrams: latest?.barMassGrams ?? recipe.barMassGrams,
    lines: latest?.lines.map((l) => ({ ingredientId: l.ingredientId, percent: l.percent })) ?? [],
  };
  return (
    <>
      <RecipeHeader recipe={recipe} current="bench" readsAll={readsAll} actions={edits ? <RecipeDetailsDialog recipe={recipe} /> : null} />
      {edits ? null : <p className="mb-4 text-sm text-cocoa-500">You can read this recipe; your role does not change it.</p>}
      <Bench
        key={`${recipe.id}:${recipe.latestVersionNo}`}
        recipe={{ id: recipe.id, name: recipe.name, chocolateType: recipe.chocolateType, targetCocoaPercent: recipe.targetCocoaPercent }}
        base={base}
        library={library}
        currency={currency}
        canEdit={edits}
      />
    </>
  );
}
