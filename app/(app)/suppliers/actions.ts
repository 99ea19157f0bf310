"use server";

import { revalidatePath } from "next/cache";
import { z } from "zod";
import { defineAction } from "@/lib/actions/define-action";
import { createQuote } from "@/lib/data/quotes";
import { createSupplier, deleteSupplier, setSupplierArchived, updateSupplier } from "@/lib/data/suppliers";
import { quoteSchema } from "@/lib/validation/quotes";
import { supplierIdSchema, supplierSchema, updateSupplierSchema } from "@/lib/validation/suppliers";

const archiveSchema = z.object({ supplierId: z.string().uuid("Unknown item."), archived: z.boolean() }).strict();

function refresh(supplierId?: string) {
  revalidatePath("/suppliers");
  if (supplierId) revalidatePath(`/suppliers/${supplierId}`);
}

export const createSupplierAction = defineAction({
  schema: supplierSchema,
  permission: "suppliers.edit",
  handler: async (input, viewer) => {
    const { id } = await createSupplier({ workspaceId: viewer.workspace.id, input });
    refresh();
    return { id };
  },
});

export const updateSupplierAction = defineAction({
  schema: updateSupplierSchema,
  permission: "suppliers.edit",
  handler: async ({ supplierId, ...input }, viewer) => {
    await updateSupplier({ workspaceId: viewer.workspace.id, supplierId, input });
    refresh(supplierId);
  },
});

export const setSupplierArchivedAction = defineAction({
  schema: archiveSchema,
  permission: "suppliers.edit",
  handler: async ({ supplierId, archived }, viewer) => {
    await setSupplierArchived({ workspaceId: viewer.workspace.id, supplierId, archived });
    refresh(supplierId);
  },
});

/** Deletes a supplier nothing refers to; otherwise refused with what refers to it. */
export const deleteSupplierAction = defineAction({
  schema: supplierIdSchema,
  permission: "suppliers.edit",
  handler: async ({ supplierId }, viewer) => {
    await deleteSupplier({ workspaceId: viewer.workspace.id, supplierId });
    refresh();
  },
});

/** Records a quote typed in by hand (a new row: history is never overwritten). */
export const createQuoteAction = defineAction({
  schema: quoteSchema,
  permission: "suppliers.edit",
  handler: async (input, viewer) => {
    const { id } = await createQuote({ workspaceId: viewer.workspace.id, userId: viewer.user.id, input });
    refresh(input.supplierId);
    revalidatePath(`/ingredients/${input.ingredientId}`);
    revalidatePath("/prices");
    return { id };
  },
});
