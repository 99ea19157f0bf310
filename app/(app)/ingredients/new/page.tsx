import type { Metadata } from "next";
import { NotAllowed } from "@/components/forms/not-allowed";
import { IngredientForm } from "@/components/ingredients/ingredient-form";
import { Card } from "@/components/ui/card";
import { requireViewer } from "@/lib/auth/current";
import { can } from "@/lib/auth/permissions";

export const metadata: Metadata = { title: "New ingredient" };

export default async function NewIngredientPage() {
  const viewer = await requireViewer();
  return (
    <div className="space-y-6">
      <h1 className="text-3xl font-bold">New ingredient</h1>
      {can(viewer.role, "ingredients.edit") ? (
        <Card>
          <IngredientForm />
        </Card>
      ) : (
        <NotAllowed what="add ingredients" who="Owners and formulators" />
      )}
    </div>
  );
}
