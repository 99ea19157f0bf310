import Link from "next/link";
import { Card, CardHeader } from "@/components/ui/card";
import type { Few, UnreleasedRecipe } from "@/lib/data/overview";
import { formatDate } from "@/lib/format";
import { FewFooter } from "./few-footer";

/** Recipes whose newest version production does not work from yet. */
export function UnreleasedCard({ recipes }: { recipes: Few<UnreleasedRecipe> }) {
  return (
    <Card data-testid="overview-unreleased">
      <CardHeader title="Changes not released" description="Recipes saved since their released version. Production keeps making the released one until a newer version is released." />
      {recipes.rows.length === 0 ? (
        <p className="text-sm text-cocoa-500">Nothing is waiting for release.</p>
      ) : (
        <ul className="divide-y divide-sand-light text-sm">
          {recipes.rows.map((r) => (
            <li key={r.id} className="flex flex-wrap items-baseline justify-between gap-x-3 gap-y-1 py-2" data-testid={`unreleased-${r.id}`}>
              <Link href={`/recipes/${r.id}/history`} className="font-semibold text-pod-dark hover:underline">
                {r.name}
              </Link>
              <span className="whitespace-nowrap text-cocoa-700">
                v{r.latestVersionNo} saved {formatDate(r.updatedAt)} · {r.releasedVersionNo === null ? "never released" : `v${r.releasedVersionNo} released`}
              </span>
            </li>
          ))}
        </ul>
      )}
      <FewFooter shown={recipes.rows.length} total={recipes.total} href="/recipes" where="Recipes" />
    </Card>
  );
}
