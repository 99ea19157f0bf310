import type { Metadata } from "next";
import { NotAllowed } from "@/components/forms/not-allowed";
import { IngredientForm } from "@/components/ingredients/ingredient-form";
import { Card } from "@/components/ui/card";
import { requireViewer } from "@/lib/auth/current";
import { can } from "@/lib/auth/permissions";
import { getIngredientById } from "@/lib/data/ingredients";
import { orNotFound, pageId } from "@/lib/pages/or-not-found";

export const metadata: Metadata = { title: "Edit ingredient" };

export default async function EditIngredientPage({ params }: { params: Promise<{ ingredientId: string }> }) {
  const viewer = await requireViewer();
  const { ingredientId } = await params;
  const ingredient = await orNotFound(getIngredientById({ workspaceId: viewer.workspace.id, ingredientId: pageId(ingredientId) }));
  return (
    <div className="space-y-6">
      <h1 className="text-3xl font-bold">Edit {ingredient.name}</h1>
      {can(viewer.role, "ingredients.edit") ? (
        <Card>
          <IngredientForm ingredient={ingredient} />
        </Card>
      ) : (
        <NotAllowed what="edit ingredient profiles" who="Owners and formulators" />
      )}
    </div>
  );
}

