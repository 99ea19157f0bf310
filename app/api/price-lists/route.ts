import { z } from "zod";
import { apiRoute } from "@/lib/api/route";
import { importPriceList, listPriceListImports } from "@/lib/data/price-list-imports";
import { MAX_PRICE_LIST_BYTES } from "@/lib/price-lists/limits";
import { isoDay } from "@/lib/pricing/convert";
import { priceListUploadSchema } from "@/lib/validation/uploads";

/** GET /api/price-lists — past uploads, newest first (optionally one supplier's). */
export const GET = apiRoute({
  permission: "ingredients.read",
  schema: z.object({ supplierId: z.string().uuid("Unknown supplier.").optional() }).strict(),
  handler: async ({ input, viewer }) => ({
    imports: await listPriceListImports({ workspaceId: viewer.workspace.id, supplierId: input.supplierId }),
  }),
});

/** POST /api/price-lists — imports the valid new rows of a price list in one transaction. */
export const POST = apiRoute({
  permission: "suppliers.edit",
  schema: priceListUploadSchema,
  body: "form",
  maxBodyBytes: MAX_PRICE_LIST_BYTES + 64 * 1024,
  handler: async ({ input, viewer }) => {
    const { file, ...options } = input;
    return importPriceList({
      workspaceId: viewer.workspace.id,
      userId: viewer.user.id,
      supplierId: options.supplierId,
      fileName: file.name,
      bytes: new Uint8Array(await file.arrayBuffer()),
      mapping: options.mapping,
      options,
      today: isoDay(new Date()),
    });
  },
});
