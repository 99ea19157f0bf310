"use server";

import { revalidatePath } from "next/cache";
import { defineAction } from "@/lib/actions/define-action";
import { deleteExchangeRate, saveExchangeRate, setBaseCurrency } from "@/lib/data/exchange-rates";
import { baseCurrencySchema, exchangeRateIdSchema, exchangeRateSchema } from "@/lib/validation/currencies";

const PATH = "/settings/currencies";

export const saveExchangeRateAction = defineAction({
  schema: exchangeRateSchema,
  permission: "suppliers.edit",
  handler: async (input, viewer) => {
    const saved = await saveExchangeRate({ workspaceId: viewer.workspace.id, userId: viewer.user.id, input });
    revalidatePath(PATH);
    return saved;
  },
});

export const deleteExchangeRateAction = defineAction({
  schema: exchangeRateIdSchema,
  permission: "suppliers.edit",
  handler: async ({ rateId }, viewer) => {
    await deleteExchangeRate({ workspaceId: viewer.workspace.id, rateId });
    revalidatePath(PATH);
  },
});

export const setBaseCurrencyAction = defineAction({
  schema: baseCurrencySchema,
  permission: "suppliers.edit",
  handler: async ({ baseCurrency }, viewer) => {
    await setBaseCurrency({ workspaceId: viewer.workspace.id, baseCurrency });
    revalidatePath(PATH);
  },
});
