import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { NewRecipeForm } from "@/components/recipes/new-recipe-form";
import { Card } from "@/components/ui/card";
import { requireViewer } from "@/lib/auth/current";
import { can } from "@/lib/auth/permissions";
import { listRecipeChoices } from "@/lib/data/recipes";
import { STARTING_POINTS } from "@/lib/recipes/starting-points";

export const metadata: Metadata = { title: "New recipe" };

export default async function NewRecipePage() {
  const viewer = await requireViewer();
  if (!can(viewer.role, "recipes.edit")) notFound();
  const copyChoices = await listRecipeChoices({ workspaceId: viewer.workspace.id });
  return (
    <div className="space-y-6">
      <div>
        <p className="text-sm">
          <Link href="/recipes" className="text-cocoa-500 hover:text-cocoa hover:underline">
            Recipes
          </Link>
        </p>
        <h1 className="mt-1 text-3xl font-bold">New recipe</h1>
      </div>
      <Card>
        <NewRecipeForm startingPoints={STARTING_POINTS} copyChoices={copyChoices} />
      </Card>
    </div>
  );
}
