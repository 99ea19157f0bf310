import { z } from "zod";
import { currencySchema, decimalText, isoDaySchema } from "./decimal";

export const exchangeRateSchema = z
  .object({
    currency: currencySchema,
    rateToBase: decimalText({ label: "the rate", max: "1000000", decimals: 10, positive: true }),
    validOn: isoDaySchema,
  })
  .strict();
export type ExchangeRateInput = z.infer<typeof exchangeRateSchema>;

export const exchangeRateIdSchema = z.object({ rateId: z.string().uuid("Unknown rate.") }).strict();

export const baseCurrencySchema = z.object({ baseCurrency: currencySchema }).strict();
