import type { Metadata } from "next";
import Link from "next/link";
import { IngredientsTable } from "@/components/ingredients/ingredients-table";
import { Button } from "@/components/ui/button";
import { canSeeCosts } from "@/lib/auth/costs";
import { requireViewer } from "@/lib/auth/current";
import { can } from "@/lib/auth/permissions";

export const metadata: Metadata = { title: "Ingredients" };

export default async function IngredientsPage() {
  const viewer = await requireViewer();
  const showPrices = await canSeeCosts(viewer);
  return (
    <div className="space-y-6">
      <div className="flex flex-wrap items-end justify-between gap-4">
        <div>
          <h1 className="text-3xl font-bold">Ingredients</h1>
          <p className="mt-2 max-w-2xl text-cocoa-700">
            What each ingredient is made of, per 100 g, with its allergens and where the figures come from
            {showPrices ? " — and what its preferred supplier charges today" : ""}.
          </p>
        </div>
        <div className="flex gap-2">
          <Button asChild variant="secondary">
            <a href="/api/ingredients/export?archived=include" download>
              Export CSV
            </a>
          </Button>
          {can(viewer.role, "ingredients.edit") ? (
            <Button asChild>
              <Link href="/ingredients/new">New ingredient</Link>
            </Button>
          ) : null}
        </div>
      </div>
      <IngredientsTable showPrices={showPrices} />
    </div>
  );
}
