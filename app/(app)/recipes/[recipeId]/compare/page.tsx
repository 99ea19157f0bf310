import type { Metadata } from "next";
import { notFound } from "next/navigation";
import { CompareForm } from "@/components/recipes/compare-form";
import { DiffTable } from "@/components/recipes/diff-table";
import { RecipeHeader } from "@/components/recipes/recipe-header";
import { Badge } from "@/components/ui/badge";
import { Card, CardHeader } from "@/components/ui/card";
import { getBaseCurrency } from "@/lib/data/exchange-rates";
import { getVersionForViewer } from "@/lib/cost-visibility/recipes";
import { listVersionNumbers } from "@/lib/data/recipes-versions";
import { diffComposition, diffCost, diffLines } from "@/lib/recipes/diff";
import { money, pct } from "@/lib/recipes/format";
import { verdict } from "@/lib/recipes/verdict";
import { versionNoSchema } from "@/lib/validation/recipes";
import { loadRecipePage, orNotFound } from "../load";

export const metadata: Metadata = { title: "Compare versions" };

const pick = (v: string | string[] | undefined, fallback: number) => {
  const parsed = versionNoSchema.safeParse(Array.isArray(v) ? v[0] : v);
  return parsed.success ? parsed.data : fallback;
};

/** Two versions side by side: lines, composition, cost (for those who may see costs), and which standards each meets. */
export default async function ComparePage({
  params,
  searchParams,
}: {
  params: Promise<{ recipeId: string }>;
  searchParams: Promise<Record<string, string | string[] | undefined>>;
}) {
  const { viewer, recipe, readsAll } = await loadRecipePage((await params).recipeId);
  if (!readsAll || recipe.latestVersionNo < 1) notFound();
  const q = await searchParams;
  const a = pick(q.a, Math.max(1, recipe.latestVersionNo - 1));
  const b = pick(q.b, recipe.latestVersionNo);
  const workspaceId = viewer.workspace.id;
  const [{ version: va, costsShown }, { version: vb }, numbers, currency] = await Promise.all([
    getVersionForViewer({ viewer, recipeId: recipe.id, versionNo: a }).catch(orNotFound),
    getVersionForViewer({ viewer, recipeId: recipe.id, versionNo: b }).catch(orNotFound),
    listVersionNumbers({ workspaceId, recipeId: recipe.id }),
    getBaseCurrency({ workspaceId }),
  ]);
  const la = `v${a}`;
  const lb = `v${b}`;
  const comparable = (v: typeof va) => ({ lines: v.lines, composition: v.evaluation.composition, costPerKg: v.costPerKg, costPerBar: v.costPerBar });
  const standards = va.evaluation.standards.map((s, i) => ({ s, other: vb.evaluation.standards[i] }));
  return (
    <>
      <RecipeHeader recipe={recipe} current="history" readsAll={readsAll} />
      <div className="space-y-6">
        <CompareForm recipeId={recipe.id} versions={[...numbers].reverse()} a={a} b={b} />
        <div className="grid grid-cols-1 gap-6 lg:grid-cols-2">
          <Card data-testid="compare-lines">
            <CardHeader title="Lines" description={`${la}: ${va.note ?? "no note"} · ${lb}: ${vb.note ?? "no note"}`} />
            <DiffTable rows={diffLines(va.lines, vb.lines)} a={la} b={lb} format={(v) => pct(v, 2)} unit="%" />
          </Card>
          <Card>
            <CardHeader title="Composition" description="Percent of the finished bar, as computed at each save." />
            <DiffTable rows={diffComposition(va.evaluation.composition, vb.evaluation.composition)} a={la} b={lb} format={(v) => pct(v)} unit="%" />
          </Card>
          {costsShown ? (
            <Card>
              <CardHeader title="Cost" description={`Ingredients only, at the prices of each save, in ${currency}.`} />
              <DiffTable rows={diffCost(comparable(va), comparable(vb))} a={la} b={lb} format={(v) => money(v, currency, 3)} unit={currency} />
            </Card>
          ) : null}
          <Card>
            <CardHeader title="Standards" description="Categories whose result differs between the two." />
            <ul className="divide-y divide-sand-light text-sm">
              {standards
                .filter(({ s, other }) => other && s.pass !== other.pass)
                .map(({ s, other }) => (
                  <li key={`${s.authority}-${s.category}`} className="flex justify-between gap-3 py-2">
                    <span>
                      {s.authority} {s.category}
                    </span>
                    <span className="flex gap-2">
                      <Badge tone={s.pass ? "meets" : "short"}>{la}: {verdict(s)}</Badge>
                      <Badge tone={other!.pass ? "meets" : "short"}>{lb}: {verdict(other!)}</Badge>
                    </span>
                  </li>
                ))}
            </ul>
            {standards.every(({ s, other }) => s.pass === other?.pass) ? <p className="text-sm text-cocoa-500">Both meet the same categories.</p> : null}
            <p className="mt-3 text-xs text-cocoa-500">Legal names depend on local regulations; these are numeric limits only.</p>
          </Card>
        </div>
      </div>
    </>
  );
}
