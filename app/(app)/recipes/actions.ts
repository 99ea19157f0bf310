"use server";

import { revalidatePath } from "next/cache";
import { defineFormAction } from "@/lib/actions/define-action";
import { createRecipe } from "@/lib/data/recipes-create";
import { createRecipeSchema } from "@/lib/validation/recipes";

/** Creates a recipe (empty, from a starting point, or a copy); the form then opens its bench. */
export const createRecipeAction = defineFormAction({
  schema: createRecipeSchema,
  permission: "recipes.edit",
  handler: async (input, viewer) => {
    const created = await createRecipe({ workspaceId: viewer.workspace.id, userId: viewer.user.id, input });
    revalidatePath("/recipes");
    return created;
  },
});
