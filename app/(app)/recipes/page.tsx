import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { Pagination } from "@/components/recipes/pagination";
import { RecipeFilters } from "@/components/recipes/recipe-filters";
import { RecipeTable } from "@/components/recipes/recipe-table";
import { Button } from "@/components/ui/button";
import { requireViewer } from "@/lib/auth/current";
import { can } from "@/lib/auth/permissions";
import { getBaseCurrency } from "@/lib/data/exchange-rates";
import { listRecipesForViewer } from "@/lib/cost-visibility/recipes";
import { listHref, parseListQuery } from "./list-query";

export const metadata: Metadata = { title: "Recipes" };

export default async function RecipesPage({ searchParams }: { searchParams: Promise<Record<string, string | string[] | undefined>> }) {
  const viewer = await requireViewer();
  if (!can(viewer.role, "recipes.readReleased")) notFound();
  const releasedOnly = !can(viewer.role, "recipes.read");
  const asked = parseListQuery(await searchParams);
  const [{ page, query, costsShown }, currency] = await Promise.all([
    listRecipesForViewer({ viewer, query: asked }),
    getBaseCurrency({ workspaceId: viewer.workspace.id }),
  ]);
  const filtered = Boolean(query.q || query.type || query.status);
  return (
    <div className="space-y-6">
      <div className="flex flex-wrap items-end justify-between gap-4">
        <div>
          <h1 className="text-3xl font-bold">Recipes</h1>
          <p className="mt-2 text-cocoa-700">
            {releasedOnly ? "The released version of each recipe, as production makes it." : "Every recipe with its latest version. Open one to work on it at the bench."}
          </p>
        </div>
        {can(viewer.role, "recipes.edit") ? (
          <Button asChild>
            <Link href="/recipes/new">New recipe</Link>
          </Button>
        ) : null}
      </div>
      <RecipeFilters query={query} showStatus={!releasedOnly} />
      {page.rows.length === 0 ? (
        <p className="rounded-card border border-sand bg-white p-6 text-cocoa-700">
          {filtered ? "No recipe matches. Clear the search or filters to see them all." : releasedOnly ? "No recipe has been released yet." : "No recipe yet. Start one from a starting point or from scratch."}
        </p>
      ) : (
        <>
          <RecipeTable page={page} query={query} currency={currency} releasedOnly={releasedOnly} showCost={costsShown} href={(c) => listHref(query, c)} />
          <Pagination page={page.page} pageCount={page.pageCount} total={page.total} href={(p) => listHref(query, { page: p })} />
        </>
      )}
    </div>
  );
}
