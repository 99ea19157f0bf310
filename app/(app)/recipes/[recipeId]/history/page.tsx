import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { CompareForm } from "@/components/recipes/compare-form";
import { RecipeHeader } from "@/components/recipes/recipe-header";
import { VersionActions } from "@/components/recipes/version-actions";
import { Badge } from "@/components/ui/badge";
import { Card, CardHeader } from "@/components/ui/card";
import { Table, Td, Th } from "@/components/ui/table";
import { listVersionsForViewer } from "@/lib/cost-visibility/recipes";
import { getBaseCurrency } from "@/lib/data/exchange-rates";
import { listReleases } from "@/lib/data/recipes-releases";
import { money, pct } from "@/lib/recipes/format";
import { loadRecipePage } from "../load";

export const metadata: Metadata = { title: "Recipe history" };

const timeFormat = new Intl.DateTimeFormat("en-GB", { day: "numeric", month: "short", year: "numeric", hour: "2-digit", minute: "2-digit" });

/** Every version, newest first; compare any two, release, restore, fork. */
export default async function HistoryPage({ params }: { params: Promise<{ recipeId: string }> }) {
  const { viewer, recipe, readsAll, edits } = await loadRecipePage((await params).recipeId);
  if (!readsAll) notFound();
  const workspaceId = viewer.workspace.id;
  const [{ versions, costsShown }, releases, currency] = await Promise.all([
    listVersionsForViewer({ viewer, recipe }),
    listReleases({ workspaceId, recipeId: recipe.id }),
    getBaseCurrency({ workspaceId }),
  ]);
  const numbers = versions.map((v) => v.versionNo);
  return (
    <>
      <RecipeHeader recipe={recipe} current="history" readsAll={readsAll} />
      <div className="space-y-6">
        {numbers.length >= 2 ? (
          <Card>
            <CardHeader title="Compare two versions" description={costsShown ? "Lines, composition and cost side by side." : "Lines and composition side by side."} />
            <CompareForm recipeId={recipe.id} versions={numbers} a={numbers[1]!} b={numbers[0]!} />
          </Card>
        ) : null}
        {versions.length === 0 ? (
          <p className="rounded-card border border-sand bg-white p-6 text-cocoa-700">No version saved yet. Save one from the bench.</p>
        ) : (
          <Table>
            <thead>
              <tr>
                <Th>Version</Th>
                <Th>Saved</Th>
                <Th>Note</Th>
                <Th numeric>Cocoa</Th>
                {costsShown ? <Th numeric>Cost per bar</Th> : null}
                <Th />
              </tr>
            </thead>
            <tbody>
              {versions.map((v) => (
                <tr key={v.versionNo} data-testid={`version-v${v.versionNo}`}>
                  <Td className="whitespace-nowrap font-semibold">
                    <Link href={`/recipes/${recipe.id}/versions/${v.versionNo}`} className="hover:text-pod-dark hover:underline">
                      v{v.versionNo}
                    </Link>
                    {recipe.releasedVersionNo === v.versionNo ? (
                      <Badge tone="meets" className="ml-2">released</Badge>
                    ) : v.released ? (
                      <Badge className="ml-2">released before</Badge>
                    ) : null}
                  </Td>
                  <Td className="whitespace-nowrap">
                    {timeFormat.format(v.createdAt)}
                    <span className="block text-xs text-cocoa-500">{v.authorName ?? "someone no longer here"}</span>
                  </Td>
                  <Td className="max-w-xs">{v.note ?? <span className="text-cocoa-300">—</span>}</Td>
                  <Td numeric>{pct(v.cocoaPercent)}</Td>
                  {costsShown ? <Td numeric>{money(v.costPerBar, currency, 3)}</Td> : null}
                  <Td>
                    {edits ? (
                      <VersionActions
                        recipeId={recipe.id}
                        recipeName={recipe.name}
                        versionNo={v.versionNo}
                        latestVersionNo={recipe.latestVersionNo}
                        isCurrentRelease={recipe.releasedVersionNo === v.versionNo}
                      />
                    ) : null}
                  </Td>
                </tr>
              ))}
            </tbody>
          </Table>
        )}
        {releases.length > 0 ? (
          <Card>
            <CardHeader title="Releases" description="Every release for production, newest first. The first is what production makes now." />
            <ul className="divide-y divide-sand-light text-sm">
              {releases.map((r, i) => (
                <li key={`${r.versionNo}-${r.createdAt.toISOString()}`} className="flex justify-between gap-3 py-2">
                  <span>
                    <strong>v{r.versionNo}</strong> released by {r.releasedByName ?? "someone no longer here"}
                    {r.note ? ` — “${r.note}”` : ""}
                    {i === 0 ? <Badge tone="meets" className="ml-2">current</Badge> : null}
                  </span>
                  <span className="whitespace-nowrap text-cocoa-500">{timeFormat.format(r.createdAt)}</span>
                </li>
              ))}
            </ul>
          </Card>
        ) : null}
      </div>
    </>
  );
}
