import type { Metadata } from "next";
import { notFound } from "next/navigation";
import { LabelSheet } from "@/components/labels/label-sheet";
import { requireViewer } from "@/lib/auth/current";
import { can } from "@/lib/auth/permissions";
import { AppError } from "@/lib/errors";
import { loadLabel } from "@/lib/labels/load-label";
import { labelVersionSchema } from "@/lib/validation/labels";
import { recipeIdSchema } from "@/lib/validation/recipes";

export const metadata: Metadata = { title: "Label" };

/** @page rules per paper; the label keeps to one page and prints its colours as shown. */
const pageCss = (paper: "a4" | "letter") => `
@page { size: ${paper === "letter" ? "letter" : "A4"}; margin: 12mm; }
html, body { background: #fff !important; }
@media print { .label-sheet { break-inside: avoid; } }
`;

/**
 * The label alone, for printing from the browser and for the server's PDF and PNG: a saved
 * version (the released one unless ?version=N), the same checks as the label page.
 */
export default async function PrintLabelPage({ params, searchParams }: { params: Promise<{ recipeId: string }>; searchParams: Promise<{ version?: string; paper?: string }> }) {
  const viewer = await requireViewer();
  if (!can(viewer.role, "recipes.readReleased")) notFound();
  const id = recipeIdSchema.safeParse((await params).recipeId);
  const query = await searchParams;
  const version = labelVersionSchema.safeParse(query.version);
  if (!id.success || !version.success) notFound();
  const paper = query.paper === "letter" ? "letter" : "a4";
  const loaded = await loadLabel({ viewer, recipeId: id.data, versionNo: version.data }).catch((err: unknown) => {
    if (err instanceof AppError && (err.code === "not_found" || err.code === "forbidden")) notFound();
    throw err;
  });
  return (
    <main className="mx-auto max-w-[190mm] bg-white p-4 print:max-w-none print:p-0">
      <style>{pageCss(paper)}</style>
      <LabelSheet name={loaded.recipe.name} barMassGrams={loaded.version.barMassGrams} versionNo={loaded.version.versionNo} view={loaded.view} />
    </main>
  );
}
