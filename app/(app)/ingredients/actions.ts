"use server";

import { revalidatePath } from "next/cache";
import { z } from "zod";
import { defineAction } from "@/lib/actions/define-action";
import {
  createIngredient,
  deleteIngredient,
  setIngredientArchived,
  setPreferredSupplier,
  updateIngredient,
} from "@/lib/data/ingredients";
import { ingredientIdSchema, ingredientSchema, preferredSupplierSchema, updateIngredientSchema } from "@/lib/validation/ingredients";

const archiveSchema = z.object({ ingredientId: z.string().uuid("Unknown item."), archived: z.boolean() }).strict();

function refresh(ingredientId?: string) {
  revalidatePath("/ingredients");
  if (ingredientId) revalidatePath(`/ingredients/${ingredientId}`);
}

export const createIngredientAction = defineAction({
  schema: ingredientSchema,
  permission: "ingredients.edit",
  handler: async (input, viewer) => {
    const { id } = await createIngredient({ workspaceId: viewer.workspace.id, input });
    refresh();
    return { id };
  },
});

export const updateIngredientAction = defineAction({
  schema: updateIngredientSchema,
  permission: "ingredients.edit",
  handler: async ({ ingredientId, ...input }, viewer) => {
    await updateIngredient({ workspaceId: viewer.workspace.id, ingredientId, input });
    refresh(ingredientId);
  },
});

export const setIngredientArchivedAction = defineAction({
  schema: archiveSchema,
  permission: "ingredients.edit",
  handler: async ({ ingredientId, archived }, viewer) => {
    await setIngredientArchived({ workspaceId: viewer.workspace.id, ingredientId, archived });
    refresh(ingredientId);
  },
});

/** Deletes an unused ingredient; refused (conflict, naming the recipes) when anything uses it. */
export const deleteIngredientAction = defineAction({
  schema: ingredientIdSchema,
  permission: "ingredients.edit",
  handler: async ({ ingredientId }, viewer) => {
    await deleteIngredient({ workspaceId: viewer.workspace.id, ingredientId });
    refresh();
  },
});

/** Which supplier's price costs the ingredient: a buying decision, so the buyer's right. */
export const setPreferredSupplierAction = defineAction({
  schema: preferredSupplierSchema,
  permission: "suppliers.edit",
  handler: async ({ ingredientId, supplierId }, viewer) => {
    await setPreferredSupplier({ workspaceId: viewer.workspace.id, ingredientId, supplierId });
    refresh(ingredientId);
  },
});
