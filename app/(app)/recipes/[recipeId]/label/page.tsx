import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { LabelCaution } from "@/components/labels/label-caution";
import { LabelDownloads } from "@/components/labels/label-downloads";
import { LabelNotes } from "@/components/labels/label-notes";
import { LabelSettingsForm } from "@/components/labels/label-settings-form";
import { LabelSheet } from "@/components/labels/label-sheet";
import { LabelVersionPicker } from "@/components/labels/label-version-picker";
import { RecipeHeader } from "@/components/recipes/recipe-header";
import { Card, CardHeader } from "@/components/ui/card";
import { listVersions } from "@/lib/data/recipes-versions";
import { AppError } from "@/lib/errors";
import { loadLabel } from "@/lib/labels/load-label";
import { labelVersionSchema } from "@/lib/validation/labels";
import { loadRecipePage } from "../load";

export const metadata: Metadata = { title: "Label" };

/** The label of a saved version (released by default), with what the maker fills in and the files to download. */
export default async function LabelPage({ params, searchParams }: { params: Promise<{ recipeId: string }>; searchParams: Promise<{ version?: string | string[] }> }) {
  const { viewer, recipe, readsAll, edits } = await loadRecipePage((await params).recipeId);
  const asked = labelVersionSchema.safeParse((await searchParams).version);
  if (!asked.success) notFound();
  const loaded = await loadLabel({ viewer, recipeId: recipe.id, versionNo: asked.data }).catch((err: unknown) => {
    if (err instanceof AppError && (err.code === "not_found" || err.code === "forbidden")) return err;
    throw err;
  });
  if (loaded instanceof AppError && asked.data !== undefined) notFound();
  return (
    <>
      <RecipeHeader recipe={recipe} current="label" readsAll={readsAll} />
      <div className="space-y-6">
        <LabelCaution />
        {loaded instanceof AppError ? (
          <Card data-testid="label-empty">
            <CardHeader title="No label yet" description="Labels are made from saved versions, never from a draft." />
            <p className="text-sm text-cocoa-700">
              {readsAll ? (
                <>
                  Save a version on the <Link className="font-semibold underline" href={`/recipes/${recipe.id}`}>bench</Link> first.
                </>
              ) : (
                "This recipe has no released version yet."
              )}
            </p>
          </Card>
        ) : (
          <>
            <div className="flex flex-wrap items-center justify-between gap-4">
              <LabelVersionPicker
                recipeId={recipe.id}
                current={loaded.version.versionNo}
                releasedNo={recipe.releasedVersionNo}
                versions={(await listVersions({ workspaceId: viewer.workspace.id, recipeId: recipe.id, releasedOnly: !readsAll })).map((v) => v.versionNo)}
              />
              <LabelDownloads recipeId={recipe.id} versionNo={loaded.version.versionNo} />
            </div>
            <div className="grid grid-cols-1 gap-6 xl:grid-cols-[minmax(0,1fr)_24rem]">
              <div className="self-start overflow-hidden rounded-card border border-sand shadow-card">
                <LabelSheet name={recipe.name} barMassGrams={loaded.version.barMassGrams} versionNo={loaded.version.versionNo} view={loaded.view} />
              </div>
              <div className="space-y-6">
                {edits ? (
                  <Card>
                    <CardHeader title="Label details" description="Kept for this recipe across versions." />
                    <LabelSettingsForm recipeId={recipe.id} settings={loaded.settings} />
                  </Card>
                ) : null}
                <Card>
                  <CardHeader title="For the person who checks it" />
                  <LabelNotes view={loaded.view} />
                </Card>
              </div>
            </div>
          </>
        )}
      </div>
    </>
  );
}
