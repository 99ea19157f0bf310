"use server";

import { revalidatePath } from "next/cache";
import { defineFormAction } from "@/lib/actions/define-action";
import { saveLabelSettings } from "@/lib/data/labels";
import { labelSettingsSchema } from "@/lib/validation/labels";

/** Saves what the maker fills in for the label: "may contain", pieces per bar, EU portion. */
export const saveLabelSettingsAction = defineFormAction({
  schema: labelSettingsSchema,
  permission: "recipes.edit",
  handler: async (input, viewer) => {
    const saved = await saveLabelSettings({ workspaceId: viewer.workspace.id, userId: viewer.user.id, input });
    revalidatePath(`/recipes/${input.recipeId}/label`);
    return { mayContain: saved.mayContain, piecesPerBar: saved.piecesPerBar, euPortionGrams: saved.euPortionGrams };
  },
});
