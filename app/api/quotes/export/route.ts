import { apiRoute } from "@/lib/api/route";
import { requireCostReader } from "@/lib/auth/costs";
import { csvResponse, toCsv } from "@/lib/csv/export";
import { listQuotes, type QuoteRecord } from "@/lib/data/quotes";
import { isoDay } from "@/lib/pricing/convert";
import { quoteListQuerySchema } from "@/lib/validation/quotes";

const UNIT = { per_kg: "per kg", per_pack: "per pack", per_tonne: "per tonne" } as const;

/** GET /api/quotes/export — quotes as CSV, safe to open in a spreadsheet; 403 for a viewer who may not see costs. */
export const GET = apiRoute({
  permission: "ingredients.read",
  schema: quoteListQuerySchema,
  handler: async ({ input, viewer }) => {
    await requireCostReader(viewer);
    const { baseCurrency, quotes } = await listQuotes({ workspaceId: viewer.workspace.id, ...input, on: input.on ?? isoDay(new Date()) });
    const columns = [
      { header: "Ingredient", value: (q: QuoteRecord) => q.ingredientName },
      { header: "Supplier", value: (q: QuoteRecord) => q.supplierName },
      { header: "Price", value: (q: QuoteRecord) => q.price },
      { header: "Currency", value: (q: QuoteRecord) => q.currency },
      { header: "Unit", value: (q: QuoteRecord) => UNIT[q.unit] },
      { header: "Pack size (kg)", value: (q: QuoteRecord) => q.packKg },
      { header: "Minimum order (kg)", value: (q: QuoteRecord) => q.minimumOrderKg },
      { header: "Valid from", value: (q: QuoteRecord) => q.validFrom },
      { header: "Valid until", value: (q: QuoteRecord) => q.validUntil },
      { header: `Price per kg (${baseCurrency}, at the valid-from day's rate)`, value: (q: QuoteRecord) => q.perKgBase },
      { header: "Current", value: (q: QuoteRecord) => (q.current ? "yes" : "no") },
      { header: "Source", value: (q: QuoteRecord) => (q.source.startsWith("price-list:") ? "price-list upload" : q.source) },
      { header: "Entered", value: (q: QuoteRecord) => q.createdAt },
    ];
    return csvResponse(toCsv(columns, quotes), "quotes.csv");
  },
});
