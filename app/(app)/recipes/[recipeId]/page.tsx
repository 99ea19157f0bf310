import type { Metadata } from "next";
import { notFound, redirect } from "next/navigation";
import { Bench } from "@/components/bench/bench";
import { RecipeDetailsDialog } from "@/components/recipes/recipe-details-dialog";
import { RecipeHeader } from "@/components/recipes/recipe-header";
import { loadBenchData } from "./bench-data";
import { loadRecipePage } from "./load";

export async function generateMetadata({ params }: { params: Promise<{ recipeId: string }> }): Promise<Metadata> {
  const { recipe } = await loadRecipePage((await params).recipeId);
  return { title: `${recipe.name} · bench` };
}

/** The bench: the latest version on sliders (read-only for those who may not edit; without costs for those who may not see them). */
export default async function BenchPage({ params }: { params: Promise<{ recipeId: string }> }) {
  const { viewer, recipe, readsAll, edits } = await loadRecipePage((await params).recipeId);
  // Production works from released versions only.
  if (!readsAll) {
    if (!recipe.releasedVersionNo) notFound();
    redirect(`/recipes/${recipe.id}/versions/${recipe.releasedVersionNo}`);
  }
  const { base, library, currency, showCosts, lotSources } = await loadBenchData({ viewer, recipe });
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
        showCosts={showCosts}
        lotSources={lotSources}
      />
    </>
  );
}
