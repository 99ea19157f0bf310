import { z } from "zod";
import { decimalText, isoDaySchema, optionalDecimalText, optionalText } from "./decimal";

const id = (message: string) => z.string().uuid(message);

/** Drafting an order to one supplier for the shortfall of some planned batches. */
export const draftOrderSchema = z
  .object({
    supplierId: id("Unknown supplier."),
    batchIds: z.array(id("Unknown batch.")).min(1, "Choose at least one planned batch.").max(200, "At most 200 batches at once."),
  })
  .strict();

/** Editing a drafted order: each line's quantity and price. */
export const updateOrderSchema = z
  .object({
    orderId: id("Unknown order."),
    notes: optionalText(2000, "the notes"),
    lines: z
      .array(
        z
          .object({
            lineId: id("Unknown order line."),
            quantityKg: decimalText({ label: "the quantity", max: "10000000", decimals: 3 }),
            price: optionalDecimalText({ label: "the price", max: "999999999999", decimals: 4, positive: true }),
          })
          .strict(),
      )
      .max(500),
  })
  .strict();

export const orderIdSchema = z.object({ orderId: id("Unknown order.") }).strict();
export const receiveOrderSchema = z.object({ orderId: id("Unknown order."), receivedOn: isoDaySchema }).strict();

export const requirementsQuerySchema = z
  .object({ batchIds: z.array(id("Unknown batch.")).max(200).optional() })
  .strict();
