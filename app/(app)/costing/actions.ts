"use server";

import { revalidatePath } from "next/cache";
import { defineAction } from "@/lib/actions/define-action";
import { setShowCostsToAll } from "@/lib/data/cost-visibility";
import { resetPicks, savePick } from "@/lib/data/cost-picks";
import { saveCostSettings } from "@/lib/data/cost-settings";
import { getBaseCurrency } from "@/lib/data/exchange-rates";
import { costSettingsSchema, costVisibilitySchema, pickSupplierSchema, resetPicksSchema } from "@/lib/validation/costing";

/** Saves a new revision of a recipe's cost settings, in today's base currency. */
export const saveCostSettingsAction = defineAction({
  schema: costSettingsSchema,
  permission: "costs.edit",
  handler: async (input, viewer) => {
    const workspaceId = viewer.workspace.id;
    const currency = await getBaseCurrency({ workspaceId });
    const saved = await saveCostSettings({ workspaceId, userId: viewer.user.id, currency, input });
    revalidatePath(`/costing/${input.recipeId}`);
    return saved;
  },
});

/** Chooses the supplier (or bean lot) of one ingredient for a recipe; "preferred" forgets the choice. */
export const pickSupplierAction = defineAction({
  schema: pickSupplierSchema,
  permission: "costs.edit",
  handler: async (input, viewer) => {
    await savePick({ workspaceId: viewer.workspace.id, userId: viewer.user.id, ...input });
    revalidatePath(`/costing/${input.recipeId}`);
  },
});

/** Back to the preferred supplier of every ingredient. */
export const resetPicksAction = defineAction({
  schema: resetPicksSchema,
  permission: "costs.edit",
  handler: async (input, viewer) => {
    await resetPicks({ workspaceId: viewer.workspace.id, recipeId: input.recipeId });
    revalidatePath(`/costing/${input.recipeId}`);
  },
});

/** The owner lets production and viewers see costs, or stops letting them. */
export const setCostVisibilityAction = defineAction({
  schema: costVisibilitySchema,
  permission: "members.manage",
  handler: async (input, viewer) => {
    await setShowCostsToAll({ workspaceId: viewer.workspace.id, show: input.show });
    revalidatePath("/costing", "layout");
    return { show: input.show };
  },
});
