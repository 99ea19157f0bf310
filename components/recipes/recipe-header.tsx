import Link from "next/link";
import type { ReactNode } from "react";
import { Badge } from "@/components/ui/badge";
import { canSeeCosts } from "@/lib/auth/costs";
import { requireViewer } from "@/lib/auth/current";
import type { RecipeRecord } from "@/lib/data/recipes";
import { pct } from "@/lib/recipes/format";
import { cn } from "@/lib/cn";

/**
 * The recipe's name and state, and its pages (bench, history, label) for those who may see every version;
 * the Costs tab only for those who may see costs (both checks are cached per request).
 */
export async function RecipeHeader({ recipe, current, readsAll, actions }: { recipe: RecipeRecord; current: "bench" | "history" | "label" | "version"; readsAll: boolean; actions?: ReactNode }) {
  const costsTab = await canSeeCosts(await requireViewer());
  const tab = (href: string, label: string, active: boolean) => (
    <Link
      href={href}
      aria-current={active ? "page" : undefined}
      className={cn("rounded-md px-3 py-1.5 text-sm font-semibold text-cocoa-700 hover:bg-cream-deep", active && "bg-pod-light text-pod-dark")}
    >
      {label}
    </Link>
  );
  return (
    <div className="mb-6 space-y-3">
      <p className="text-sm">
        <Link href="/recipes" className="text-cocoa-500 hover:text-cocoa hover:underline">
          Recipes
        </Link>
      </p>
      <div className="flex flex-wrap items-start justify-between gap-4">
        <div>
          <h1 className="text-3xl font-bold" data-testid="recipe-name">
            {recipe.name}
          </h1>
          <p className="mt-2 flex flex-wrap items-center gap-2 text-sm text-cocoa-700">
            <Badge className="capitalize">{recipe.chocolateType}</Badge>
            {recipe.targetCocoaPercent ? <span>target {pct(recipe.targetCocoaPercent, 0)} cocoa</span> : null}
            {readsAll ? <span>· {recipe.latestVersionNo ? `latest v${recipe.latestVersionNo}` : "no version saved yet"}</span> : null}
            {recipe.releasedVersionNo ? <Badge tone="meets">released v{recipe.releasedVersionNo}</Badge> : <span>· not released</span>}
          </p>
          {recipe.notes ? <p className="mt-2 max-w-2xl whitespace-pre-line text-sm text-cocoa-700">{recipe.notes}</p> : null}
        </div>
        {actions}
      </div>
      {readsAll ? (
        <nav aria-label="Recipe" className="flex gap-1">
          {tab(`/recipes/${recipe.id}`, "Bench", current === "bench")}
          {tab(`/recipes/${recipe.id}/history`, "History", current === "history")}
          {costsTab ? tab(`/costing/${recipe.id}`, "Costs", false) : null}
          {tab(`/recipes/${recipe.id}/label`, "Label", current === "label")}
        </nav>
      ) : null}
    </div>
  );
}
