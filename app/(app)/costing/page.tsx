import type { Metadata } from "next";
import Link from "next/link";
import { CostsNotAllowed } from "@/components/costing/costs-not-allowed";
import { perBar } from "@/components/costing/figures";
import { VisibilityToggle } from "@/components/costing/visibility-toggle";
import { Pagination } from "@/components/recipes/pagination";
import { Button } from "@/components/ui/button";
import { Card, CardHeader } from "@/components/ui/card";
import { Input } from "@/components/ui/input";
import { Table, Td, Th } from "@/components/ui/table";
import { canSeeCosts } from "@/lib/auth/costs";
import { requireViewer } from "@/lib/auth/current";
import { can } from "@/lib/auth/permissions";
import { getShowCostsToAll } from "@/lib/data/cost-visibility";
import { getBaseCurrency } from "@/lib/data/exchange-rates";
import { listRecipes } from "@/lib/data/recipes-list";
import { formatPercent } from "@/lib/format";
import { recipeListQuerySchema } from "@/lib/validation/recipes";

export const metadata: Metadata = { title: "Costing" };

/** Every recipe with its cost per bar at its last save; open one to cost it, or tick several to compare. */
export default async function CostingPage({ searchParams }: { searchParams: Promise<Record<string, string | string[] | undefined>> }) {
  const viewer = await requireViewer();
  if (!(await canSeeCosts(viewer))) return <CostsNotAllowed />;
  const raw = await searchParams;
  const one = (v: string | string[] | undefined) => (Array.isArray(v) ? v[0] : v);
  const parsed = recipeListQuerySchema.safeParse({ q: one(raw.q) || undefined, page: one(raw.page) ?? "1", sort: "name", dir: "asc" });
  const query = parsed.success ? parsed.data : recipeListQuerySchema.parse({ sort: "name", dir: "asc" });
  const workspaceId = viewer.workspace.id;
  const releasedOnly = !can(viewer.role, "recipes.read");
  const [list, currency, shared] = await Promise.all([listRecipes({ workspaceId, query, releasedOnly }), getBaseCurrency({ workspaceId }), getShowCostsToAll({ workspaceId })]);
  const href = (page: number) => `/costing?${new URLSearchParams({ ...(query.q ? { q: query.q } : {}), page: String(page) })}`;
  return (
    <div className="space-y-6">
      <div>
        <h1 className="text-3xl font-bold">Costing</h1>
        <p className="mt-1 max-w-2xl text-sm text-cocoa-700">
          What each bar costs, from whom to buy each ingredient, and how the margin moves when prices do. Open a recipe to cost it at today&apos;s quotes;
          tick several to compare them side by side.
        </p>
      </div>
      {can(viewer.role, "members.manage") ? (
        <Card>
          <CardHeader title="Who sees costs" description="The owner, the buyer and the formulator always do." />
          <VisibilityToggle shown={shared} />
        </Card>
      ) : null}
      <form method="get" className="flex max-w-md gap-2" role="search">
        <Input name="q" defaultValue={query.q ?? ""} placeholder="Search recipes" aria-label="Search recipes" />
        <Button type="submit" variant="secondary">
          Search
        </Button>
      </form>
      <form method="get" action="/costing/compare" className="space-y-3">
        <Table>
          <thead>
            <tr>
              <Th className="w-16">Compare</Th>
              <Th>Recipe</Th>
              <Th numeric>Cocoa</Th>
              <Th numeric>Ingredients per bar at last save</Th>
            </tr>
          </thead>
          <tbody>
            {list.rows.map((r) => (
              <tr key={r.id}>
                <Td>
                  {r.versionNo > 0 ? <input type="checkbox" name="v" value={`${r.id}:${r.versionNo}`} aria-label={`Compare ${r.name}`} className="h-4 w-4 accent-pod" /> : null}
                </Td>
                <Td>
                  {r.versionNo > 0 ? (
                    <Link href={`/costing/${r.id}`} className="font-semibold text-pod-dark hover:underline">
                      {r.name}
                    </Link>
                  ) : (
                    <span>{r.name} (no version saved)</span>
                  )}
                  <span className="block text-xs text-cocoa-500">{r.versionNo > 0 ? `v${r.versionNo}` : ""}</span>
                </Td>
                <Td numeric>{formatPercent(r.cocoaPercent, 1)}</Td>
                <Td numeric>{perBar(r.costPerBar, currency)}</Td>
              </tr>
            ))}
          </tbody>
        </Table>
        {list.rows.length === 0 ? <p className="text-sm text-cocoa-500">No recipe matches.</p> : null}
        <Button type="submit" variant="secondary">
          Compare the ticked recipes
        </Button>
      </form>
      <Pagination page={list.page} pageCount={list.pageCount} total={list.total} href={href} />
    </div>
  );
}
