"use server";

import { revalidatePath } from "next/cache";
import { defineAction, defineFormAction } from "@/lib/actions/define-action";
import { updateRecipeDetails } from "@/lib/data/recipes";
import { copyVersion, restoreVersion } from "@/lib/data/recipes-create";
import { releaseVersion } from "@/lib/data/recipes-releases";
import { saveRecipeVersion } from "@/lib/data/recipes-save";
import {
  forkVersionSchema,
  recipeDetailsSchema,
  releaseVersionSchema,
  restoreVersionSchema,
  saveVersionSchema,
} from "@/lib/validation/recipes";

function changed(recipeId: string) {
  revalidatePath("/recipes");
  revalidatePath(`/recipes/${recipeId}`, "layout");
}

/**
 * Saves the bench's draft as a new version. The draft names the version it
 * started from; if another was saved since, the result is a conflict and
 * nothing is written (the bench then shows both).
 */
export const saveRecipeVersionAction = defineAction({
  schema: saveVersionSchema,
  permission: "recipes.edit",
  handler: async (input, viewer) => {
    const saved = await saveRecipeVersion({ ...input, workspaceId: viewer.workspace.id, authorId: viewer.user.id });
    changed(input.recipeId);
    return saved;
  },
});

/** Saves an old version's lines as a new version on top of the latest. */
export const restoreRecipeVersionAction = defineAction({
  schema: restoreVersionSchema,
  permission: "recipes.edit",
  handler: async (input, viewer) => {
    const saved = await restoreVersion({ ...input, workspaceId: viewer.workspace.id, userId: viewer.user.id });
    changed(input.recipeId);
    return saved;
  },
});

/** Marks a version released for production (an append-only record). */
export const releaseRecipeVersionAction = defineAction({
  schema: releaseVersionSchema,
  permission: "recipes.edit",
  handler: async (input, viewer) => {
    await releaseVersion({ ...input, workspaceId: viewer.workspace.id, userId: viewer.user.id });
    changed(input.recipeId);
  },
});

/** Starts a new recipe from a version of this one. */
export const forkRecipeVersionAction = defineAction({
  schema: forkVersionSchema,
  permission: "recipes.edit",
  handler: async (input, viewer) => {
    const created = await copyVersion({
      workspaceId: viewer.workspace.id,
      userId: viewer.user.id,
      recipeId: input.recipeId,
      versionNo: input.versionNo,
      fields: { name: input.name },
    });
    revalidatePath("/recipes");
    return created;
  },
});

/** Renames the recipe or changes its type, target or notes. */
export const updateRecipeDetailsAction = defineFormAction({
  schema: recipeDetailsSchema,
  permission: "recipes.edit",
  handler: async ({ recipeId, ...details }, viewer) => {
    await updateRecipeDetails({ workspaceId: viewer.workspace.id, recipeId, details });
    changed(recipeId);
    return { recipeId };
  },
});
