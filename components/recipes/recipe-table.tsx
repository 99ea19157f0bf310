import Link from "next/link";
import { Badge } from "@/components/ui/badge";
import { Table, Td, Th } from "@/components/ui/table";
import type { RecipeListPage } from "@/lib/data/recipes-list";
import { DEFAULT_DIRECTION } from "@/lib/recipes/list-defaults";
import { money, pct } from "@/lib/recipes/format";
import type { RecipeListQuery, RecipeSort } from "@/lib/validation/recipes";

const dateFormat = new Intl.DateTimeFormat("en-GB", { day: "numeric", month: "short", year: "numeric" });

function SortHeader({ label, sort, query, numeric, href }: { label: string; sort: RecipeSort; query: RecipeListQuery; numeric?: boolean; href: (c: Partial<RecipeListQuery>) => string }) {
  const active = query.sort === sort;
  const dir = query.dir ?? DEFAULT_DIRECTION[query.sort];
  const next = active ? (dir === "asc" ? "desc" : "asc") : DEFAULT_DIRECTION[sort];
  return (
    <Th numeric={numeric} aria-sort={active ? (dir === "asc" ? "ascending" : "descending") : undefined}>
      <Link href={href({ sort, dir: next })} className="hover:text-cocoa">
        {label}
        {active ? <span aria-hidden>{dir === "asc" ? " ↑" : " ↓"}</span> : null}
      </Link>
    </Th>
  );
}

/** One page of recipes; production rows link to the released version, others to the bench. The cost column only for those who may see costs. */
export function RecipeTable({
  page,
  query,
  currency,
  releasedOnly,
  showCost,
  href,
}: {
  page: RecipeListPage;
  query: RecipeListQuery;
  currency: string;
  releasedOnly: boolean;
  showCost: boolean;
  href: (change: Partial<RecipeListQuery>) => string;
}) {
  return (
    <Table>
      <thead>
        <tr>
          <SortHeader label="Name" sort="name" query={query} href={href} />
          <Th>Type</Th>
          <Th>Version</Th>
          <SortHeader label="Cocoa" sort="cocoa" query={query} numeric href={href} />
          {showCost ? <SortHeader label="Cost per bar" sort="cost" query={query} numeric href={href} /> : null}
          <SortHeader label="Updated" sort="updated" query={query} href={href} />
        </tr>
      </thead>
      <tbody>
        {page.rows.map((r) => (
          <tr key={r.id} data-testid="recipe-row">
            <Td className="font-semibold">
              <Link href={releasedOnly ? `/recipes/${r.id}/versions/${r.versionNo}` : `/recipes/${r.id}`} className="hover:text-pod-dark hover:underline">
                {r.name}
              </Link>
            </Td>
            <Td className="capitalize">{r.chocolateType}</Td>
            <Td>
              {r.versionNo ? `v${r.versionNo}` : <span className="text-cocoa-500">not saved yet</span>}
              {r.releasedVersionNo ? (
                <Badge tone="meets" className="ml-2">
                  released v{r.releasedVersionNo}
                </Badge>
              ) : null}
            </Td>
            <Td numeric>{pct(r.cocoaPercent)}</Td>
            {showCost ? <Td numeric>{money(r.costPerBar, currency, 3)}</Td> : null}
            <Td>{dateFormat.format(r.updatedAt)}</Td>
          </tr>
        ))}
      </tbody>
    </Table>
  );
}
