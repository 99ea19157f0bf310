import { apiRoute } from "@/lib/api/route";
import { checkPriceList } from "@/lib/price-lists/check";
import { MAX_PRICE_LIST_BYTES } from "@/lib/price-lists/limits";
import { isoDay } from "@/lib/pricing/convert";
import { priceListUploadSchema } from "@/lib/validation/uploads";

/**
 * POST /api/price-lists/preview — reads a supplier's CSV price list and judges
 * every row (with the given column mapping, or a guessed one). Writes nothing.
 */
export const POST = apiRoute({
  permission: "suppliers.edit",
  schema: priceListUploadSchema,
  body: "form",
  maxBodyBytes: MAX_PRICE_LIST_BYTES + 64 * 1024,
  handler: async ({ input, viewer }) => {
    const { file, ...options } = input;
    return checkPriceList({
      workspaceId: viewer.workspace.id,
      supplierId: options.supplierId,
      fileName: file.name,
      bytes: new Uint8Array(await file.arrayBuffer()),
      mapping: options.mapping,
      options,
      today: isoDay(new Date()),
    });
  },
});
